import type { ProjectAction } from '@shared/auth/permissions';
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
import { projectParams, versionConflictSchema } from '@shared/schemas/common';
import { sheetQuerySchema } from '@shared/schemas/sheets';
import { submittalSchema } from '@shared/schemas/submittals';
import { z } from 'zod';
import { HttpError } from '../http/errors';
import { errorResponse, refusals, via } from '../http/responses';
import { defineRoute, sendPdf } from '../http/route';
import { receiveUpload, sendStoredFile } from '../http/upload';
import type { Services } from '../services';
import type { Actor } from '../services/inspections/queries';

const errors = refusals('project', 'inspection, item, deficiency or photo');
const conflictOf = (what: string, schema: z.ZodType) => ({
  409: {
    description: `Archived project, a closed inspection, a state that does not allow this step, or a stale version (\`current\` is the ${what} as it is now)`,
    schema: versionConflictSchema(schema),
  },
});
const invalid = (description?: string): Record<number, ReturnType<typeof errorResponse>> =>
  description ? { 422: errorResponse(description) } : {};

const viaInspection = via('inspectionId', (s, id) => s.inspections.projectOf(id));
const viaItem = via('inspectionItemId', (s, id) => s.inspections.projectOfItem(id));
const viaDeficiency = via('deficiencyId', (s, id) => s.inspections.projectOfDeficiency(id));
const viaPhoto = via('photoId', (s, id) => s.inspections.projectOfPhoto(id));
const viaSubmittal = via('submittalId', (s, id) => s.submittals.projectOf(id));

const inspectionParams = z.object({ inspectionId: z.uuid() });
const itemParams = z.object({ inspectionItemId: z.uuid() });
const deficiencyParams = z.object({ deficiencyId: z.uuid() });
const actor = (u: { id: string; name: string }) => ({ id: u.id, name: u.name });

/** A change or workflow step of a deficiency, naming the version read: the deficiency as it now stands. */
function deficiencyStep<B>(def: {
  method: 'put' | 'post';
  step?: 'correct' | 'accept' | 'reopen';
  summary: string;
  action: ProjectAction;
  body: z.ZodType<B>;
  example: unknown;
  /** The 422 of a body that names something that does not fit. */
  invalid?: string;
  run: (s: Services['inspections'], id: string, who: Actor, body: B) => Promise<unknown>;
}) {
  return defineRoute({
    method: def.method,
    path: def.step ? `/deficiencies/:deficiencyId/${def.step}` : '/deficiencies/:deficiencyId',
    summary: def.summary,
    tag: 'Inspections',
    access: { kind: 'project', action: def.action, ...viaDeficiency },
    params: deficiencyParams,
    body: def.body,
    example: def.example,
    responses: {
      200: { description: 'The deficiency', schema: deficiencySchema },
      ...errors,
      ...conflictOf('deficiency', deficiencySchema),
      ...invalid(def.invalid),
    },
    handler: ({ params, user, body, services }) =>
      def.run(services.inspections, params.deficiencyId, actor(user), body),
  });
}

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
      409: errorResponse('Archived project'),
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
      409: errorResponse('Archived project'),
      413: errorResponse('A photo too large, too many, or the project’s storage quota reached'),
      415: errorResponse('Not multipart, or a file that is not a PNG or JPEG image'),
      503: errorResponse('Too many uploads at once: try again after `Retry-After` seconds'),
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
  deficiencyStep({
    method: 'put',
    summary: 'Set a deficiency’s owner (a project member), due date or description, naming its version',
    action: 'deficiency.review',
    body: deficiencyUpdateSchema,
    example: { version: 1, dueDate: '2027-01-15' },
    invalid: 'The owner is not a member of the project',
    run: (s, id, who, body) => s.updateDeficiency(id, who, body),
  }),
  deficiencyStep({
    method: 'post',
    step: 'correct',
    summary:
      'Mark a deficiency corrected (open or reopened), with a photo of the item taken since it was opened',
    action: 'deficiency.correct',
    body: deficiencyCorrectSchema,
    example: { version: 1, photoId: '00000000-0000-4000-8000-000000000000', note: 'Clip added at grid C.' },
    invalid: 'No such photo of the item taken since the deficiency was opened',
    run: (s, id, who, body) => s.correct(id, who, body),
  }),
  deficiencyStep({
    method: 'post',
    step: 'accept',
    summary: 'Accept a corrected deficiency (an inspector)',
    action: 'deficiency.review',
    body: deficiencyAcceptSchema,
    example: { version: 2, note: '' },
    run: (s, id, who, body) => s.accept(id, who, body),
  }),
  deficiencyStep({
    method: 'post',
    step: 'reopen',
    summary: 'Reopen a corrected or accepted deficiency, saying what is still wrong (an inspector)',
    action: 'deficiency.review',
    body: deficiencyReopenSchema,
    example: { version: 2, note: 'The sealant is still short at the head.' },
    run: (s, id, who, body) => s.reopen(id, who, body),
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
      409: errorResponse('Archived project, a submittal that is not a draft, or too many items'),
      413: errorResponse('The project’s storage quota reached'),
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
