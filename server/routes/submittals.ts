import { versionConflictSchema } from '@shared/schemas/common';
import {
  attachSheetSchema,
  commentCreateSchema,
  submittalCreateSchema,
  submittalDecisionInputSchema,
  submittalListQuerySchema,
  submittalListSchema,
  submittalSchema,
  submittalStepSchema,
  submittalUpdateSchema,
  UPLOAD_LIMITS,
  uploadResultSchema,
} from '@shared/schemas/submittals';
import { z } from 'zod';
import { errorResponse, refusals } from '../http/responses';
import { member, routeGroup } from '../http/route-group';
import { receiveUpload, sendStoredFile } from '../http/upload';

const errors = refusals('project', 'project, submittal or item', {
  forbidden: 'Your role (or not being a named reviewer) does not allow this',
});
const stateErrors = {
  409: {
    description:
      'Archived project, a status that does not allow this step (a decided revision is read-only), or a stale version (`current` is the submittal as it is now)',
    schema: versionConflictSchema(submittalSchema),
  },
};

const route = routeGroup('Submittals', errors);
const actor = (u: { id: string; name: string }) => ({ id: u.id, name: u.name });

const exampleFields = {
  title: 'Insulated metal wall panels — product data and compliance sheet',
  description: '',
  specSection: '07 42 13',
  specTitle: 'Metal Wall Panels',
  dueDate: '2027-01-15',
  reviewerIds: [],
};

export const submittalRoutes = [
  route.get('/projects/:projectId/submittals', member('submittal.read'), {
    summary: 'Submittals of a project, latest revision of each (`?status=` to filter)',
    query: submittalListQuerySchema,
    responses: { 200: { description: 'Submittals', schema: submittalListSchema } },
    handler: async ({ project, query, services }) => ({
      submittals: await services.submittals.list(project.id, query.status),
    }),
  }),
  route.post('/projects/:projectId/submittals', member('submittal.create'), {
    summary: 'Start a submittal (revision 1, draft); the number defaults to "<section>-<next>"',
    body: submittalCreateSchema,
    example: exampleFields,
    responses: {
      201: { description: 'The new draft', schema: submittalSchema },
      409: errorResponse('Archived project or number already used'),
      422: errorResponse('A reviewer is not a project member who reviews submittals'),
    },
    handler: ({ project, user, body, services }) => services.submittals.create(project.id, actor(user), body),
  }),
  route.get('/submittals/:submittalId', member('submittal.read'), {
    summary: 'One submittal revision: items, reviewers, comments, decision and the revision chain',
    responses: { 200: { description: 'The submittal', schema: submittalSchema } },
    handler: ({ params, services }) => services.submittals.get(params.submittalId),
  }),
  route.put('/submittals/:submittalId', member('submittal.create'), {
    summary: 'Edit a draft (title, section, due date, reviewers) naming the version it was based on',
    body: submittalUpdateSchema,
    example: { version: 1, changes: exampleFields },
    responses: {
      200: { description: 'The edited draft', schema: submittalSchema },
      ...stateErrors,
      422: errorResponse('A reviewer is not a project member who reviews submittals'),
    },
    handler: ({ params, user, body, services }) =>
      services.submittals.update(params.submittalId, actor(user), body.version, body.changes),
  }),
  route.post('/submittals/:submittalId/sheets', member('submittal.create'), {
    summary: 'Attach the compliance sheet of a stored check run of the same project',
    body: attachSheetSchema,
    example: { checkRunId: '00000000-0000-4000-8000-000000000000' },
    responses: {
      201: { description: 'The submittal with the sheet', schema: submittalSchema },
      ...stateErrors,
    },
    handler: ({ params, user, body, services }) =>
      services.submittals.attachSheet(params.submittalId, actor(user), body.checkRunId),
  }),
  route.post('/submittals/:submittalId/files', member('submittal.create'), {
    summary: `Upload files (multipart/form-data, field "files"): PDF, PNG, JPEG or DWG by content, at most ${UPLOAD_LIMITS.maxFiles} files of ${UPLOAD_LIMITS.maxFileBytes / 1024 / 1024} MB each; all or nothing`,
    responses: {
      201: { description: 'The stored files and the submittal', schema: uploadResultSchema },
      ...stateErrors,
      413: errorResponse('A file too large, too many files, or the project’s storage quota reached'),
      415: errorResponse('Not multipart, or a file whose content is not an accepted type'),
      503: errorResponse('Too many uploads at once: try again after `Retry-After` seconds'),
    },
    handler: ({ req, res, params, user, services }) =>
      services.submittals.upload(params.submittalId, actor(user), receiveUpload(req, res)),
  }),
  route.delete('/submittals/:submittalId/items/:submittalItemId', member('submittal.create'), {
    summary: 'Remove an item from a draft',
    responses: {
      200: { description: 'The submittal without the item', schema: submittalSchema },
      ...stateErrors,
    },
    handler: ({ params, user, services }) =>
      services.submittals.removeItem(params.submittalId, actor(user), params.submittalItemId),
  }),
  route.get('/submittals/:submittalId/items/:submittalItemId/file', member('submittal.read'), {
    summary: 'Download an uploaded file, byte for byte, with its detected type',
    responses: {
      200: { description: 'The file', contentType: 'application/octet-stream', schema: z.string() },
    },
    handler: async ({ params, res, services }) =>
      sendStoredFile(res, await services.submittals.file(params.submittalId, params.submittalItemId)),
  }),
  route.post('/submittals/:submittalId/submit', member('submittal.submit'), {
    summary: 'Submit a draft to its reviewers (e-mails them)',
    body: submittalStepSchema,
    example: {},
    responses: {
      200: { description: 'The submitted revision', schema: submittalSchema },
      ...stateErrors,
      422: errorResponse('No item or no reviewer yet'),
    },
    handler: ({ params, user, body, services }) =>
      services.submittals.submit(params.submittalId, actor(user), body.version),
  }),
  route.post('/submittals/:submittalId/review', member('submittal.review'), {
    summary: 'Take a submitted revision under review (a named reviewer)',
    body: submittalStepSchema,
    example: {},
    responses: { 200: { description: 'Under review', schema: submittalSchema }, ...errors, ...stateErrors },
    handler: ({ params, user, body, services }) =>
      services.submittals.startReview(params.submittalId, actor(user), body.version),
  }),
  route.post('/submittals/:submittalId/decision', member('submittal.review'), {
    summary:
      'Record a named reviewer’s decision: approved, approved as noted, revise and resubmit or rejected. Every named reviewer decides; the last one closes the revision with the most severe decision (revise and resubmit opens the next revision) and the submitter is e-mailed',
    body: submittalDecisionInputSchema,
    example: {
      decision: 'approved_as_noted',
      note: 'Confirm the clip spacing at the corners on the shop drawings.',
    },
    responses: {
      200: {
        description: 'The revision with the decision (closed once every reviewer has decided)',
        schema: submittalSchema,
      },
      ...stateErrors,
      422: errorResponse(
        'Approving a package whose attached compliance sheet fails without `failingSheetConfirmation`',
      ),
    },
    handler: ({ params, user, body, services }) =>
      services.submittals.decide(params.submittalId, actor(user), body),
  }),
  route.post('/submittals/:submittalId/comments', member('submittal.comment'), {
    summary: 'Comment on the submittal or on one of its items (while it is undecided)',
    body: commentCreateSchema,
    example: { body: 'Please add the clip test report.', itemId: null },
    responses: {
      201: { description: 'The submittal with the comment', schema: submittalSchema },
      ...stateErrors,
    },
    handler: ({ params, user, body, services }) =>
      services.submittals.comment(params.submittalId, actor(user), body.body, body.itemId),
  }),
];
