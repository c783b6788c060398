import {
  attachReportSchema,
  deficiencyAcceptSchema,
  deficiencyCorrectSchema,
  deficiencyReopenSchema,
  deficiencySchema,
  deficiencyUpdateSchema,
  inspectionCloseResultSchema,
  inspectionCloseSchema,
  inspectionCreateSchema,
  inspectionItemSchema,
  inspectionListSchema,
  inspectionSchema,
  inspectionTemplateAnswerSchema,
  inspectionTemplateSchema,
  inspectionTemplateUpdateSchema,
  itemAnswerResultSchema,
  itemAnswerSchema,
  PHOTO_LIMITS,
  photoUploadResultSchema,
} from '@shared/inspections/schema';
import { apiErrorSchema, projectParams, versionConflictSchema } from '@shared/schemas/common';
import { sheetQuerySchema } from '@shared/schemas/sheets';
import { submittalSchema } from '@shared/schemas/submittals';
import { z } from 'zod';
import { HttpError } from '../http/errors';
import { defineRoute, sendPdf } from '../http/route';
import { receiveUpload, sendStoredFile } from '../http/upload';
import type { Services } from '../services';

const errors = {
  400: { description: 'Invalid fields', schema: apiErrorSchema },
  401: { description: 'Not signed in', schema: apiErrorSchema },
  403: { description: 'Your role does not allow this', schema: apiErrorSchema },
  404: {
    description: 'No such inspection, item, deficiency or photo, or you are not a member',
    schema: apiErrorSchema,
  },
};
const conflictOf = (what: string, schema: z.ZodType) => ({
  409: {
    description: `Archived project, a closed inspection, a state that does not allow this step, or a stale version (\`current\` is the ${what} as it is now)`,
    schema: versionConflictSchema(schema),
  },
});
const invalid = (description: string) => ({ 422: { description, schema: apiErrorSchema } });

type Ctx = { params: Record<string, string>; services: Services };
const via =
  (param: string, find: (s: Services['inspections'], id: string) => Promise<string | null>) =>
  ({ params, services }: Ctx) =>
    z.uuid().safeParse(params[param]).success
      ? find(services.inspections, params[param]!)
      : Promise.resolve(null);
const viaInspection = { projectId: via('inspectionId', (s, id) => s.projectOf(id)) };
const viaItem = { projectId: via('inspectionItemId', (s, id) => s.projectOfItem(id)) };
const viaDeficiency = { projectId: via('deficiencyId', (s, id) => s.projectOfDeficiency(id)) };
const viaPhoto = { projectId: via('photoId', (s, id) => s.projectOfPhoto(id)) };
const viaSubmittal = {
  projectId: ({ params, services }: Ctx) =>
    z.uuid().safeParse(params.submittalId).success
      ? services.submittals.projectOf(params.submittalId!)
      : Promise.resolve(null),
};

const inspectionParams = z.object({ inspectionId: z.uuid() });
const itemParams = z.object({ inspectionItemId: z.uuid() });
const deficiencyParams = z.object({ deficiencyId: z.uuid() });
const actor = (u: { id: string; name: string }) => ({ id: u.id, name: u.name });

export const inspectionRoutes = [
  defineRoute({
    method: 'get',
    path: '/projects/:projectId/inspections',
    summary:
      'Field inspections of a project, newest first, with counts of items by state and open deficiencies',
    tag: 'Inspections',
    access: { kind: 'project', action: 'inspection.read' },
    params: projectParams,
    responses: { 200: { description: 'Inspections', schema: inspectionListSchema }, ...errors },
    handler: async ({ project, services }) => ({ inspections: await services.inspections.list(project.id) }),
  }),
  defineRoute({
    method: 'post',
    path: '/projects/:projectId/inspections',
    summary:
      'Start an inspection: the checklist is generated from the assembly revision (its latest check run cited) over the scope, with the firm’s template items',
    tag: 'Inspections',
    access: { kind: 'project', action: 'inspection.create' },
    params: projectParams,
    body: inspectionCreateSchema,
    example: {
      assemblyId: '00000000-0000-4000-8000-000000000000',
      elevation: 'North elevation',
      area: { kind: 'zone', zone: 'corner' },
    },
    responses: {
      201: { description: 'The new inspection', schema: inspectionSchema },
      ...errors,
      409: { description: 'Archived project', schema: apiErrorSchema },
      ...invalid('No such assembly on this project, or no such revision'),
    },
    handler: ({ project, user, body, services }) =>
      services.inspections.create(project.record, actor(user), body),
  }),
  defineRoute({
    method: 'get',
    path: '/inspections/:inspectionId',
    summary: 'One inspection whole: scope, items with their answers and photos, deficiencies, signatures',
    tag: 'Inspections',
    access: { kind: 'project', action: 'inspection.read', ...viaInspection },
    params: inspectionParams,
    responses: { 200: { description: 'The inspection', schema: inspectionSchema }, ...errors },
    handler: ({ params, services }) => services.inspections.get(params.inspectionId),
  }),
  defineRoute({
    method: 'put',
    path: '/inspection-items/:inspectionItemId',
    summary:
      'Answer an item (state, measured value in SI, note, location) naming the item version it was based on; a failed item opens a deficiency',
    tag: 'Inspections',
    access: { kind: 'project', action: 'inspection.answer', ...viaItem },
    params: itemParams,
    body: itemAnswerSchema,
    example: { version: 1, state: 'pass', measured: 1.195, note: '', location: 'Grid B, level 2' },
    responses: {
      200: { description: 'The item, and the deficiency its failure opened', schema: itemAnswerResultSchema },
      ...errors,
      ...conflictOf('item', inspectionItemSchema),
      ...invalid(
        'A measured value on an item that is only looked at, a fractional count, or a pass outside the tolerance',
      ),
    },
    handler: ({ params, user, body, services }) =>
      services.inspections.answer(params.inspectionItemId, actor(user), body),
  }),
  defineRoute({
    method: 'post',
    path: '/inspection-items/:inspectionItemId/photos',
    summary: `Add photos to an item (multipart/form-data, field "files"): PNG or JPEG by content, at most ${PHOTO_LIMITS.maxFiles} of ${PHOTO_LIMITS.maxFileBytes / 1024 / 1024} MB each; all or nothing`,
    tag: 'Inspections',
    access: { kind: 'project', action: 'inspection.answer', ...viaItem },
    params: itemParams,
    responses: {
      201: { description: 'The stored photos and the item', schema: photoUploadResultSchema },
      ...errors,
      409: { description: 'Archived project', schema: apiErrorSchema },
      413: {
        description: 'A photo too large, too many, or the project’s storage quota reached',
        schema: apiErrorSchema,
      },
      415: {
        description: 'Not multipart, or a file that is not a PNG or JPEG image',
        schema: apiErrorSchema,
      },
      503: {
        description: 'Too many uploads at once: try again after `Retry-After` seconds',
        schema: apiErrorSchema,
      },
    },
    handler: ({ req, res, params, user, services }) =>
      services.inspections.uploadPhotos(
        params.inspectionItemId,
        actor(user),
        receiveUpload(req, res, { fileBytes: PHOTO_LIMITS.maxFileBytes, files: PHOTO_LIMITS.maxFiles }),
      ),
  }),
  defineRoute({
    method: 'get',
    path: '/inspection-photos/:photoId',
    summary: 'A photo, byte for byte, with its detected type',
    tag: 'Inspections',
    access: { kind: 'project', action: 'inspection.read', ...viaPhoto },
    params: z.object({ photoId: z.uuid() }),
    responses: {
      200: { description: 'The image', contentType: 'image/jpeg', schema: z.string() },
      ...errors,
    },
    handler: async ({ params, res, services }) =>
      sendStoredFile(res, await services.inspections.photo(params.photoId)),
  }),
  defineRoute({
    method: 'get',
    path: '/inspections/:inspectionId/report.pdf',
    summary:
      'The field report (PDF): scope, each item with design, limits, measured value, state and photos, open deficiencies, signatures, cautions, report code',
    tag: 'Inspections',
    access: { kind: 'project', action: 'inspection.read', ...viaInspection },
    params: inspectionParams,
    query: sheetQuerySchema,
    responses: {
      200: {
        description: 'The report',
        contentType: 'application/pdf',
        schema: z.string().describe('PDF bytes'),
      },
      ...errors,
    },
    handler: async ({ params, query, user, res, services }) => {
      const doc = await services.inspections.report(params.inspectionId, user.id, query.units);
      return sendPdf(res, doc, query.disposition);
    },
  }),
  defineRoute({
    method: 'post',
    path: '/inspections/:inspectionId/close',
    summary:
      'Close (sign off) an inspection once every item has a state; the answer lists the deficiencies still open',
    tag: 'Inspections',
    access: { kind: 'project', action: 'inspection.close', ...viaInspection },
    params: inspectionParams,
    body: inspectionCloseSchema,
    example: { version: 1 },
    responses: {
      200: {
        description: 'The closed inspection and its open deficiencies',
        schema: inspectionCloseResultSchema,
      },
      ...errors,
      ...conflictOf('inspection', inspectionSchema),
      ...invalid('An item is not yet seen (`items_unseen`)'),
    },
    handler: ({ params, user, body, services }) =>
      services.inspections.close(params.inspectionId, actor(user), body.version),
  }),
  defineRoute({
    method: 'put',
    path: '/deficiencies/:deficiencyId',
    summary: 'Set a deficiency’s owner (a project member), due date or description, naming its version',
    tag: 'Inspections',
    access: { kind: 'project', action: 'deficiency.review', ...viaDeficiency },
    params: deficiencyParams,
    body: deficiencyUpdateSchema,
    example: { version: 1, dueDate: '2027-01-15' },
    responses: {
      200: { description: 'The deficiency', schema: deficiencySchema },
      ...errors,
      ...conflictOf('deficiency', deficiencySchema),
      ...invalid('The owner is not a member of the project'),
    },
    handler: ({ params, user, body, services }) =>
      services.inspections.updateDeficiency(params.deficiencyId, actor(user), body),
  }),
  defineRoute({
    method: 'post',
    path: '/deficiencies/:deficiencyId/correct',
    summary:
      'Mark a deficiency corrected (open or reopened), with a photo of the item taken since it was opened',
    tag: 'Inspections',
    access: { kind: 'project', action: 'deficiency.correct', ...viaDeficiency },
    params: deficiencyParams,
    body: deficiencyCorrectSchema,
    example: { version: 1, photoId: '00000000-0000-4000-8000-000000000000', note: 'Clip added at grid C.' },
    responses: {
      200: { description: 'The deficiency', schema: deficiencySchema },
      ...errors,
      ...conflictOf('deficiency', deficiencySchema),
      ...invalid('No such photo of the item taken since the deficiency was opened'),
    },
    handler: ({ params, user, body, services }) =>
      services.inspections.correct(params.deficiencyId, actor(user), body),
  }),
  defineRoute({
    method: 'post',
    path: '/deficiencies/:deficiencyId/accept',
    summary: 'Accept a corrected deficiency (an inspector)',
    tag: 'Inspections',
    access: { kind: 'project', action: 'deficiency.review', ...viaDeficiency },
    params: deficiencyParams,
    body: deficiencyAcceptSchema,
    example: { version: 2, note: '' },
    responses: {
      200: { description: 'The deficiency', schema: deficiencySchema },
      ...errors,
      ...conflictOf('deficiency', deficiencySchema),
    },
    handler: ({ params, user, body, services }) =>
      services.inspections.accept(params.deficiencyId, actor(user), body),
  }),
  defineRoute({
    method: 'post',
    path: '/deficiencies/:deficiencyId/reopen',
    summary: 'Reopen a corrected or accepted deficiency, saying what is still wrong (an inspector)',
    tag: 'Inspections',
    access: { kind: 'project', action: 'deficiency.review', ...viaDeficiency },
    params: deficiencyParams,
    body: deficiencyReopenSchema,
    example: { version: 2, note: 'The sealant is still short at the head.' },
    responses: {
      200: { description: 'The deficiency', schema: deficiencySchema },
      ...errors,
      ...conflictOf('deficiency', deficiencySchema),
    },
    handler: ({ params, user, body, services }) =>
      services.inspections.reopen(params.deficiencyId, actor(user), body),
  }),
  defineRoute({
    method: 'get',
    path: '/organisations/:orgId/inspection-template',
    summary:
      'The firm’s checklist template (its latest version): items added to every inspection of its projects',
    tag: 'Inspections',
    access: { kind: 'organisation', action: 'firm.read' },
    params: z.object({ orgId: z.uuid() }),
    responses: {
      200: { description: 'The template, or null', schema: inspectionTemplateAnswerSchema },
      ...errors,
    },
    handler: async ({ params, services }) => ({
      template: await services.inspections.template(params.orgId),
    }),
  }),
  defineRoute({
    method: 'put',
    path: '/organisations/:orgId/inspection-template',
    summary:
      'Save the firm’s checklist template naming the revision read; a version used by an inspection is frozen, so saving it makes the next version',
    tag: 'Inspections',
    access: { kind: 'organisation', action: 'firm.write' },
    params: z.object({ orgId: z.uuid() }),
    body: inspectionTemplateUpdateSchema,
    example: { items: [{ group: 'firm', label: 'Site left clean, offcuts removed', designText: '' }] },
    responses: {
      200: { description: 'The saved version', schema: inspectionTemplateSchema },
      ...errors,
      409: {
        description: 'A stale or missing revision (`current` is the template as it is now)',
        schema: versionConflictSchema(inspectionTemplateAnswerSchema.shape.template),
      },
    },
    handler: ({ params, user, body, services }) =>
      services.inspections.saveTemplate(params.orgId, actor(user), body),
  }),
  defineRoute({
    method: 'post',
    path: '/submittals/:submittalId/inspection-reports',
    summary:
      'Add the field report (PDF) of an inspection of the same project to a draft submittal, as a file item',
    tag: 'Inspections',
    access: { kind: 'project', action: 'submittal.create', ...viaSubmittal },
    params: z.object({ submittalId: z.uuid() }),
    body: attachReportSchema,
    example: { inspectionId: '00000000-0000-4000-8000-000000000000' },
    responses: {
      201: { description: 'The submittal with the report', schema: submittalSchema },
      ...errors,
      409: {
        description: 'Archived project, a submittal that is not a draft, or too many items',
        schema: apiErrorSchema,
      },
      413: { description: 'The project’s storage quota reached', schema: apiErrorSchema },
      ...invalid('No such inspection on this project'),
    },
    handler: async ({ params, project, user, body, services }) => {
      if ((await services.inspections.projectOf(body.inspectionId)) !== project.id)
        throw new HttpError(422, 'invalid_input', 'inspectionId: no such inspection on this project', {
          inspectionId: 'no such inspection on this project',
        });
      const { pdf, filename, code } = await services.inspections.report(
        body.inspectionId,
        user.id,
        body.units,
      );
      return services.submittals.attachGenerated(params.submittalId, actor(user), {
        name: filename,
        contentType: 'application/pdf',
        bytes: pdf,
        about: { inspection: body.inspectionId, reportCode: code },
      });
    },
  }),
];
