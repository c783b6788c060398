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
import { versionConflictSchema } from '@shared/schemas/common';
import { sheetQuerySchema } from '@shared/schemas/sheets';
import { submittalSchema } from '@shared/schemas/submittals';
import { z } from 'zod';
import { HttpError } from '../http/errors';
import { errorResponse, refusals } from '../http/responses';
import { sendPdf } from '../http/route';
import { firm, member, routeGroup } from '../http/route-group';
import { receiveUpload, sendStoredFile } from '../http/upload';
import type { Services } from '../services';
import type { Actor } from '../services/inspections/queries';

const route = routeGroup('Inspections', refusals('project', 'inspection, item, deficiency or photo'));
const conflictOf = (what: string, schema: z.ZodType) => ({
  409: {
    description: `Archived project, a closed inspection, a state that does not allow this step, or a stale version (\`current\` is the ${what} as it is now)`,
    schema: versionConflictSchema(schema),
  },
});
const invalid = (description?: string): Record<number, ReturnType<typeof errorResponse>> =>
  description ? { 422: errorResponse(description) } : {};

const actor = (u: { id: string; name: string }) => ({ id: u.id, name: u.name });

/**
 * A change (`PUT /deficiencies/:deficiencyId`, step null) or a workflow step (`POST …/<step>`) of a deficiency,
 * naming the version read: the deficiency as it now stands.
 */
function deficiencyStep<B>(
  step: 'correct' | 'accept' | 'reopen' | null,
  action: ProjectAction,
  def: {
    summary: string;
    body: z.ZodType<B>;
    example: unknown;
    /** The 422 of a body that names something that does not fit. */
    invalid?: string;
    run: (s: Services['inspections'], id: string, who: Actor, body: B) => Promise<unknown>;
  },
) {
  const path = step ? `/deficiencies/:deficiencyId/${step}` : '/deficiencies/:deficiencyId';
  return route[step ? 'post' : 'put'](path as '/deficiencies/:deficiencyId', member(action), {
    summary: def.summary,
    body: def.body,
    example: def.example,
    responses: {
      200: { description: 'The deficiency', schema: deficiencySchema },
      ...conflictOf('deficiency', deficiencySchema),
      ...invalid(def.invalid),
    },
    handler: ({ params, user, body, services }) =>
      def.run(services.inspections, params.deficiencyId, actor(user), body),
  });
}

export const inspectionRoutes = [
  route.get('/projects/:projectId/inspections', member('inspection.read'), {
    summary:
      'Field inspections of a project, newest first, with counts of items by state and open deficiencies',
    responses: { 200: { description: 'Inspections', schema: inspectionListSchema } },
    handler: async ({ project, services }) => ({ inspections: await services.inspections.list(project.id) }),
  }),
  route.post('/projects/:projectId/inspections', member('inspection.create'), {
    summary:
      'Start an inspection: the checklist is generated from the assembly revision (its latest check run cited) over the scope, with the firm’s template items',
    body: inspectionCreateSchema,
    example: {
      assemblyId: '00000000-0000-4000-8000-000000000000',
      elevation: 'North elevation',
      area: { kind: 'zone', zone: 'corner' },
    },
    responses: {
      201: { description: 'The new inspection', schema: inspectionSchema },
      409: errorResponse('Archived project'),
      ...invalid('No such assembly on this project, or no such revision'),
    },
    handler: ({ project, user, body, services }) =>
      services.inspections.create(project.record, actor(user), body),
  }),
  route.get('/inspections/:inspectionId', member('inspection.read'), {
    summary: 'One inspection whole: scope, items with their answers and photos, deficiencies, signatures',
    responses: { 200: { description: 'The inspection', schema: inspectionSchema } },
    handler: ({ params, services }) => services.inspections.get(params.inspectionId),
  }),
  route.put('/inspection-items/:inspectionItemId', member('inspection.answer'), {
    summary:
      'Answer an item (state, measured value in SI, note, location) naming the item version it was based on; a failed item opens a deficiency',
    body: itemAnswerSchema,
    example: { version: 1, state: 'pass', measured: 1.195, note: '', location: 'Grid B, level 2' },
    responses: {
      200: { description: 'The item, and the deficiency its failure opened', schema: itemAnswerResultSchema },
      ...conflictOf('item', inspectionItemSchema),
      ...invalid(
        'A measured value on an item that is only looked at, a fractional count, or a pass outside the tolerance',
      ),
    },
    handler: ({ params, user, body, services }) =>
      services.inspections.answer(params.inspectionItemId, actor(user), body),
  }),
  route.post('/inspection-items/:inspectionItemId/photos', member('inspection.answer'), {
    summary: `Add photos to an item (multipart/form-data, field "files"): PNG or JPEG by content, at most ${PHOTO_LIMITS.maxFiles} of ${PHOTO_LIMITS.maxFileBytes / 1024 / 1024} MB each; all or nothing`,
    responses: {
      201: { description: 'The stored photos and the item', schema: photoUploadResultSchema },
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
  route.get('/inspection-photos/:photoId', member('inspection.read'), {
    summary: 'A photo, byte for byte, with its detected type',
    responses: {
      200: { description: 'The image', contentType: 'image/jpeg', schema: z.string() },
    },
    handler: async ({ params, res, services }) =>
      sendStoredFile(res, await services.inspections.photo(params.photoId)),
  }),
  route.get('/inspections/:inspectionId/report.pdf', member('inspection.read'), {
    summary:
      'The field report (PDF): scope, each item with design, limits, measured value, state and photos, open deficiencies, signatures, cautions, report code',
    query: sheetQuerySchema,
    responses: {
      200: {
        description: 'The report',
        contentType: 'application/pdf',
        schema: z.string().describe('PDF bytes'),
      },
    },
    handler: async ({ params, query, user, res, services }) => {
      const doc = await services.inspections.report(params.inspectionId, user.id, query.units);
      return sendPdf(res, doc, query.disposition);
    },
  }),
  route.post('/inspections/:inspectionId/close', member('inspection.close'), {
    summary:
      'Close (sign off) an inspection once every item has a state; the answer lists the deficiencies still open',
    body: inspectionCloseSchema,
    example: { version: 1 },
    responses: {
      200: {
        description: 'The closed inspection and its open deficiencies',
        schema: inspectionCloseResultSchema,
      },
      ...conflictOf('inspection', inspectionSchema),
      ...invalid('An item is not yet seen (`items_unseen`)'),
    },
    handler: ({ params, user, body, services }) =>
      services.inspections.close(params.inspectionId, actor(user), body.version),
  }),
  deficiencyStep(null, 'deficiency.review', {
    summary: 'Set a deficiency’s owner (a project member), due date or description, naming its version',
    body: deficiencyUpdateSchema,
    example: { version: 1, dueDate: '2027-01-15' },
    invalid: 'The owner is not a member of the project',
    run: (s, id, who, body) => s.updateDeficiency(id, who, body),
  }),
  deficiencyStep('correct', 'deficiency.correct', {
    summary:
      'Mark a deficiency corrected (open or reopened), with a photo of the item taken since it was opened',
    body: deficiencyCorrectSchema,
    example: { version: 1, photoId: '00000000-0000-4000-8000-000000000000', note: 'Clip added at grid C.' },
    invalid: 'No such photo of the item taken since the deficiency was opened',
    run: (s, id, who, body) => s.correct(id, who, body),
  }),
  deficiencyStep('accept', 'deficiency.review', {
    summary: 'Accept a corrected deficiency (an inspector)',
    body: deficiencyAcceptSchema,
    example: { version: 2, note: '' },
    run: (s, id, who, body) => s.accept(id, who, body),
  }),
  deficiencyStep('reopen', 'deficiency.review', {
    summary: 'Reopen a corrected or accepted deficiency, saying what is still wrong (an inspector)',
    body: deficiencyReopenSchema,
    example: { version: 2, note: 'The sealant is still short at the head.' },
    run: (s, id, who, body) => s.reopen(id, who, body),
  }),
  route.get('/organisations/:orgId/inspection-template', firm('firm.read'), {
    summary:
      'The firm’s checklist template (its latest version): items added to every inspection of its projects',
    responses: {
      200: { description: 'The template, or null', schema: inspectionTemplateAnswerSchema },
    },
    handler: async ({ params, services }) => ({
      template: await services.inspections.template(params.orgId),
    }),
  }),
  route.put('/organisations/:orgId/inspection-template', firm('firm.write'), {
    summary:
      'Save the firm’s checklist template naming the revision read; a version used by an inspection is frozen, so saving it makes the next version',
    body: inspectionTemplateUpdateSchema,
    example: { items: [{ group: 'firm', label: 'Site left clean, offcuts removed', designText: '' }] },
    responses: {
      200: { description: 'The saved version', schema: inspectionTemplateSchema },
      409: {
        description: 'A stale or missing revision (`current` is the template as it is now)',
        schema: versionConflictSchema(inspectionTemplateAnswerSchema.shape.template),
      },
    },
    handler: ({ params, user, body, services }) =>
      services.inspections.saveTemplate(params.orgId, actor(user), body),
  }),
  route.post('/submittals/:submittalId/inspection-reports', member('submittal.create'), {
    summary:
      'Add the field report (PDF) of an inspection of the same project to a draft submittal, as a file item',
    body: attachReportSchema,
    example: { inspectionId: '00000000-0000-4000-8000-000000000000' },
    responses: {
      201: { description: 'The submittal with the report', schema: submittalSchema },
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
