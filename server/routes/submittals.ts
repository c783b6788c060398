import { projectParams, versionConflictSchema } from '@shared/schemas/common';
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
import { errorResponse, refusals, via } from '../http/responses';
import { defineRoute } from '../http/route';
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

const viaSubmittal = via('submittalId', (s, id) => s.submittals.projectOf(id));
const submittalParams = z.object({ submittalId: z.uuid() });
const itemParams = submittalParams.extend({ submittalItemId: z.uuid() });
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
  defineRoute({
    method: 'get',
    path: '/projects/:projectId/submittals',
    summary: 'Submittals of a project, latest revision of each (`?status=` to filter)',
    tag: 'Submittals',
    access: { kind: 'project', action: 'submittal.read' },
    params: projectParams,
    query: submittalListQuerySchema,
    responses: { 200: { description: 'Submittals', schema: submittalListSchema }, ...errors },
    handler: async ({ project, query, services }) => ({
      submittals: await services.submittals.list(project.id, query.status),
    }),
  }),
  defineRoute({
    method: 'post',
    path: '/projects/:projectId/submittals',
    summary: 'Start a submittal (revision 1, draft); the number defaults to "<section>-<next>"',
    tag: 'Submittals',
    access: { kind: 'project', action: 'submittal.create' },
    params: projectParams,
    body: submittalCreateSchema,
    example: exampleFields,
    responses: {
      201: { description: 'The new draft', schema: submittalSchema },
      ...errors,
      409: errorResponse('Archived project or number already used'),
      422: errorResponse('A reviewer is not a project member who reviews submittals'),
    },
    handler: ({ project, user, body, services }) => services.submittals.create(project.id, actor(user), body),
  }),
  defineRoute({
    method: 'get',
    path: '/submittals/:submittalId',
    summary: 'One submittal revision: items, reviewers, comments, decision and the revision chain',
    tag: 'Submittals',
    access: { kind: 'project', action: 'submittal.read', ...viaSubmittal },
    params: submittalParams,
    responses: { 200: { description: 'The submittal', schema: submittalSchema }, ...errors },
    handler: ({ params, services }) => services.submittals.get(params.submittalId),
  }),
  defineRoute({
    method: 'put',
    path: '/submittals/:submittalId',
    summary: 'Edit a draft (title, section, due date, reviewers) naming the version it was based on',
    tag: 'Submittals',
    access: { kind: 'project', action: 'submittal.create', ...viaSubmittal },
    params: submittalParams,
    body: submittalUpdateSchema,
    example: { version: 1, changes: exampleFields },
    responses: {
      200: { description: 'The edited draft', schema: submittalSchema },
      ...errors,
      ...stateErrors,
      422: errorResponse('A reviewer is not a project member who reviews submittals'),
    },
    handler: ({ params, user, body, services }) =>
      services.submittals.update(params.submittalId, actor(user), body.version, body.changes),
  }),
  defineRoute({
    method: 'post',
    path: '/submittals/:submittalId/sheets',
    summary: 'Attach the compliance sheet of a stored check run of the same project',
    tag: 'Submittals',
    access: { kind: 'project', action: 'submittal.create', ...viaSubmittal },
    params: submittalParams,
    body: attachSheetSchema,
    example: { checkRunId: '00000000-0000-4000-8000-000000000000' },
    responses: {
      201: { description: 'The submittal with the sheet', schema: submittalSchema },
      ...errors,
      ...stateErrors,
    },
    handler: ({ params, user, body, services }) =>
      services.submittals.attachSheet(params.submittalId, actor(user), body.checkRunId),
  }),
  defineRoute({
    method: 'post',
    path: '/submittals/:submittalId/files',
    summary: `Upload files (multipart/form-data, field "files"): PDF, PNG, JPEG or DWG by content, at most ${UPLOAD_LIMITS.maxFiles} files of ${UPLOAD_LIMITS.maxFileBytes / 1024 / 1024} MB each; all or nothing`,
    tag: 'Submittals',
    access: { kind: 'project', action: 'submittal.create', ...viaSubmittal },
    params: submittalParams,
    responses: {
      201: { description: 'The stored files and the submittal', schema: uploadResultSchema },
      ...errors,
      ...stateErrors,
      413: errorResponse('A file too large, too many files, or the project’s storage quota reached'),
      415: errorResponse('Not multipart, or a file whose content is not an accepted type'),
      503: errorResponse('Too many uploads at once: try again after `Retry-After` seconds'),
    },
    handler: ({ req, res, params, user, services }) =>
      services.submittals.upload(params.submittalId, actor(user), receiveUpload(req, res)),
  }),
  defineRoute({
    method: 'delete',
    path: '/submittals/:submittalId/items/:submittalItemId',
    summary: 'Remove an item from a draft',
    tag: 'Submittals',
    access: { kind: 'project', action: 'submittal.create', ...viaSubmittal },
    params: itemParams,
    responses: {
      200: { description: 'The submittal without the item', schema: submittalSchema },
      ...errors,
      ...stateErrors,
    },
    handler: ({ params, user, services }) =>
      services.submittals.removeItem(params.submittalId, actor(user), params.submittalItemId),
  }),
  defineRoute({
    method: 'get',
    path: '/submittals/:submittalId/items/:submittalItemId/file',
    summary: 'Download an uploaded file, byte for byte, with its detected type',
    tag: 'Submittals',
    access: { kind: 'project', action: 'submittal.read', ...viaSubmittal },
    params: itemParams,
    responses: {
      200: { description: 'The file', contentType: 'application/octet-stream', schema: z.string() },
      ...errors,
    },
    handler: async ({ params, res, services }) =>
      sendStoredFile(res, await services.submittals.file(params.submittalId, params.submittalItemId)),
  }),
  defineRoute({
    method: 'post',
    path: '/submittals/:submittalId/submit',
    summary: 'Submit a draft to its reviewers (e-mails them)',
    tag: 'Submittals',
    access: { kind: 'project', action: 'submittal.submit', ...viaSubmittal },
    params: submittalParams,
    body: submittalStepSchema,
    example: {},
    responses: {
      200: { description: 'The submitted revision', schema: submittalSchema },
      ...errors,
      ...stateErrors,
      422: errorResponse('No item or no reviewer yet'),
    },
    handler: ({ params, user, body, services }) =>
      services.submittals.submit(params.submittalId, actor(user), body.version),
  }),
  defineRoute({
    method: 'post',
    path: '/submittals/:submittalId/review',
    summary: 'Take a submitted revision under review (a named reviewer)',
    tag: 'Submittals',
    access: { kind: 'project', action: 'submittal.review', ...viaSubmittal },
    params: submittalParams,
    body: submittalStepSchema,
    example: {},
    responses: { 200: { description: 'Under review', schema: submittalSchema }, ...errors, ...stateErrors },
    handler: ({ params, user, body, services }) =>
      services.submittals.startReview(params.submittalId, actor(user), body.version),
  }),
  defineRoute({
    method: 'post',
    path: '/submittals/:submittalId/decision',
    summary:
      'Record a named reviewer’s decision: approved, approved as noted, revise and resubmit or rejected. Every named reviewer decides; the last one closes the revision with the most severe decision (revise and resubmit opens the next revision) and the submitter is e-mailed',
    tag: 'Submittals',
    access: { kind: 'project', action: 'submittal.review', ...viaSubmittal },
    params: submittalParams,
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
      ...errors,
      ...stateErrors,
      422: errorResponse(
        'Approving a package whose attached compliance sheet fails without `failingSheetConfirmation`',
      ),
    },
    handler: ({ params, user, body, services }) =>
      services.submittals.decide(params.submittalId, actor(user), body),
  }),
  defineRoute({
    method: 'post',
    path: '/submittals/:submittalId/comments',
    summary: 'Comment on the submittal or on one of its items (while it is undecided)',
    tag: 'Submittals',
    access: { kind: 'project', action: 'submittal.comment', ...viaSubmittal },
    params: submittalParams,
    body: commentCreateSchema,
    example: { body: 'Please add the clip test report.', itemId: null },
    responses: {
      201: { description: 'The submittal with the comment', schema: submittalSchema },
      ...errors,
      ...stateErrors,
    },
    handler: ({ params, user, body, services }) =>
      services.submittals.comment(params.submittalId, actor(user), body.body, body.itemId),
  }),
];
