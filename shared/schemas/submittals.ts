import { z } from 'zod';
import { projectRoleSchema } from '../auth/permissions';
import { verdictSchema } from '../checks/report';
import { calendarDate, int4, TEXT_MAX, text, versionedFields, wordedEnum } from './common';

/**
 * Submittals: a package the cladding subcontractor (or the owner) sends to the design team for review —
 * compliance sheets (stored check runs) and uploaded files — under a number, a specification section and a
 * revision. Workflow: draft → submitted → under review → approved / approved as noted / revise and
 * resubmit / rejected. "Revise and resubmit" closes the revision and opens the next one as a draft; every
 * decided revision stays as it was (read-only).
 */

/** Every status with plain words and a glyph, so that it reads without colour (and in grey-scale print). */
export const [SUBMITTAL_STATUSES, submittalStatusSchema, SUBMITTAL_STATUS_TEXT] = wordedEnum({
  draft: { label: 'Draft', glyph: '○' },
  submitted: { label: 'Submitted', glyph: '→' },
  under_review: { label: 'Under review', glyph: '…' },
  approved: { label: 'Approved', glyph: '✓' },
  approved_as_noted: { label: 'Approved as noted', glyph: '✓' },
  revise_and_resubmit: { label: 'Revise and resubmit', glyph: '↻' },
  rejected: { label: 'Rejected', glyph: '✕' },
});
export type SubmittalStatus = z.infer<typeof submittalStatusSchema>;

/** The statuses a decision closes a revision with. */
export const submittalDecisionSchema = submittalStatusSchema.extract([
  'approved',
  'approved_as_noted',
  'revise_and_resubmit',
  'rejected',
]);
export const SUBMITTAL_DECISIONS = submittalDecisionSchema.options;
export type SubmittalDecision = z.infer<typeof submittalDecisionSchema>;

/** Decided revisions never change again. */
export const isDecided = (s: SubmittalStatus) => (SUBMITTAL_DECISIONS as readonly string[]).includes(s);

/** Decisions that need the reviewer's words (what to note, revise or why it is rejected). */
export const DECISIONS_NEEDING_A_NOTE: readonly SubmittalDecision[] = [
  'approved_as_noted',
  'revise_and_resubmit',
  'rejected',
];

/**
 * Several reviewers: every named reviewer decides (architect, envelope consultant and engineer each sign their
 * part); the revision closes when the last one has, and its outcome is the most severe of their decisions.
 * Most severe first.
 */
export const DECISIONS_BY_SEVERITY: readonly SubmittalDecision[] = [
  'rejected',
  'revise_and_resubmit',
  'approved_as_noted',
  'approved',
];

/** The outcome of a revision from its reviewers' decisions: the most severe one (null when there are none). */
export const combinedDecision = (decisions: readonly SubmittalDecision[]): SubmittalDecision | null =>
  DECISIONS_BY_SEVERITY.find((d) => decisions.includes(d)) ?? null;

/** Decisions that let the work proceed. */
export const isApproval = (d: SubmittalDecision) => d === 'approved' || d === 'approved_as_noted';

/**
 * Approving a package whose attached compliance sheet fails needs this word typed (`failingSheetConfirmation`).
 * An incomplete sheet (a check not evaluated, none failing) is warned about but needs no confirmation.
 */
export const FAILING_SHEET_CONFIRMATION = 'APPROVE';
export const confirmsFailingSheet = (typed: string | undefined) =>
  (typed ?? '').trim().toUpperCase() === FAILING_SHEET_CONFIRMATION;

/** Reviewers are named as project members by their user id. */
const reviewerIds = z
  .array(z.string().trim().min(1).max(100))
  .max(20, 'at most 20 reviewers')
  .refine((ids) => new Set(ids).size === ids.length, 'a reviewer is listed twice')
  .describe('User ids of project members whose role allows reviewing submittals');

/** CSI MasterFormat section number: "07 42 13", optionally with a level-4 suffix ("07 42 13.13"). */
export const specSectionSchema = z
  .string()
  .trim()
  .regex(/^\d{2} \d{2} \d{2}(\.\d{2})?$/, 'a MasterFormat number such as "07 42 13"');

export const submittalFieldsSchema = z.object({
  title: text(TEXT_MAX.name).min(1, 'a submittal needs a title'),
  description: text(TEXT_MAX.note).default(''),
  specSection: specSectionSchema,
  specTitle: text(TEXT_MAX.name)
    .min(1, 'name the section, e.g. "Metal Wall Panels"')
    .describe('MasterFormat section title'),
  dueDate: calendarDate().nullable().default(null).describe('When the review is due (null = not set)'),
  reviewerIds: reviewerIds.default([]),
});
export type SubmittalFields = z.infer<typeof submittalFieldsSchema>;

export const submittalCreateSchema = submittalFieldsSchema.extend({
  number: z
    .string()
    .trim()
    .max(50)
    .regex(/^[\w .\-/]*$/, 'letters, digits, spaces and . - / only')
    .optional()
    .describe('Submittal number; omitted = "<section>-<next number>", e.g. "07 42 13-001"'),
});
export type SubmittalCreate = z.infer<typeof submittalCreateSchema>;

/** An edit of a draft names the version it was based on (optimistic concurrency). */
export const submittalUpdateSchema = z.object({
  version: int4(),
  changes: submittalFieldsSchema,
});
export type SubmittalUpdate = z.infer<typeof submittalUpdateSchema>;

/** A workflow step; `version` (optional) refuses the step when the submittal changed since it was read. */
export const submittalStepSchema = z.object({ version: int4().optional() });

export const submittalDecisionInputSchema = z
  .object({
    decision: submittalDecisionSchema,
    note: text(TEXT_MAX.note).default(''),
    failingSheetConfirmation: z
      .string()
      .max(100)
      .optional()
      .describe(
        `Required (the word ${FAILING_SHEET_CONFIRMATION}) to approve a package whose attached compliance sheet fails`,
      ),
    version: int4().optional(),
  })
  .refine((d) => !DECISIONS_NEEDING_A_NOTE.includes(d.decision) || d.note.length > 0, {
    path: ['note'],
    message: 'say what is noted, what to revise or why it is rejected',
  });
export type SubmittalDecisionInput = z.infer<typeof submittalDecisionInputSchema>;

export const attachSheetSchema = z.object({
  checkRunId: z.uuid().describe('A stored check run of the same project'),
});

export const commentCreateSchema = z.object({
  body: text(TEXT_MAX.note).min(1, 'write a comment'),
  itemId: z.uuid().nullable().default(null).describe('The item commented on; null = the whole submittal'),
});

export const FILE_KINDS = ['pdf', 'png', 'jpeg', 'dwg'] as const;

const person = z.object({ id: z.string(), name: z.string() });

const itemBase = z.object({
  id: z.uuid(),
  position: z.number().int(),
  addedBy: z.string().nullable(),
  createdAt: z.string(),
});

export const submittalItemSchema = z.discriminatedUnion('kind', [
  itemBase.extend({
    kind: z.literal('sheet'),
    sheet: z.object({
      checkRunId: z.uuid(),
      assemblyName: z.string(),
      assemblyRevision: z.number().int(),
      criteriaSetName: z.string(),
      criteriaSetVersion: z.number().int(),
      verdict: verdictSchema,
      verificationCode: z.string(),
      runAt: z.string(),
    }),
  }),
  itemBase.extend({
    kind: z.literal('file'),
    file: z.object({
      name: z.string().describe('Original name, sanitised for display (no path, no control characters)'),
      contentType: z.string().describe('Detected from the content, never from the name'),
      size: z.number().int().describe('Bytes'),
      sha256: z.string(),
    }),
  }),
]);
export type SubmittalItem = z.infer<typeof submittalItemSchema>;
type SheetItem = Extract<SubmittalItem, { kind: 'sheet' }>;

/** The attached compliance sheets with this verdict. */
export const sheetsWithVerdict = (items: readonly SubmittalItem[], verdict: SheetItem['sheet']['verdict']) =>
  items.filter((i): i is SheetItem => i.kind === 'sheet' && i.sheet.verdict === verdict);

export const submittalCommentSchema = z.object({
  id: z.uuid(),
  itemId: z.uuid().nullable(),
  author: z.string().nullable(),
  authorRole: projectRoleSchema.nullable(),
  body: z.string(),
  createdAt: z.string(),
});
export type SubmittalComment = z.infer<typeof submittalCommentSchema>;

export const submittalSummarySchema = z.object({
  id: z.uuid(),
  projectId: z.uuid(),
  lineageId: z.uuid(),
  number: z.string(),
  title: z.string(),
  specSection: z.string(),
  specTitle: z.string(),
  revision: z.number().int(),
  status: submittalStatusSchema,
  submitter: person.nullable(),
  dueDate: z.string().nullable(),
  itemCount: z.number().int(),
  ...versionedFields,
  submittedAt: z.string().nullable(),
  decidedAt: z.string().nullable(),
});
export type SubmittalSummary = z.infer<typeof submittalSummarySchema>;

export const submittalSchema = submittalSummarySchema.extend({
  description: z.string(),
  /** The named reviewers, each with their own decision once made (null: still to decide). */
  reviewers: z.array(
    person.extend({
      role: projectRoleSchema.nullable(),
      decision: z.object({ decision: submittalDecisionSchema, note: z.string(), at: z.string() }).nullable(),
    }),
  ),
  items: z.array(submittalItemSchema),
  comments: z.array(submittalCommentSchema),
  /** The revision's outcome once closed (the most severe of its reviewers' decisions). */
  decision: z
    .object({
      decision: submittalDecisionSchema,
      note: z.string().describe('The reviewers’ notes (each named when there are several)'),
      by: z.string().nullable().describe('Who decided (the names of every reviewer who did)'),
      at: z.string(),
    })
    .nullable(),
  /** Every revision of this submittal, oldest first (this one included). */
  revisions: z.array(
    z.object({
      id: z.uuid(),
      revision: z.number().int(),
      status: submittalStatusSchema,
      createdAt: z.string(),
      decidedAt: z.string().nullable(),
    }),
  ),
  /** True once decided: nothing of this revision changes any more. */
  readOnly: z.boolean(),
});
export type Submittal = z.infer<typeof submittalSchema>;

export const submittalListSchema = z.object({ submittals: z.array(submittalSummarySchema) });
export const submittalListQuerySchema = z.object({
  status: submittalStatusSchema.optional().describe('Only submittals in this status'),
});

export const uploadResultSchema = z.object({
  items: z.array(submittalItemSchema),
  submittal: submittalSchema,
});

/** Upload limits, enforced by the server and shown by the client. */
export const UPLOAD_LIMITS = {
  maxFileBytes: 20 * 1024 * 1024,
  maxFiles: 5,
  accepted: 'PDF, PNG, JPEG or DWG',
} as const;
