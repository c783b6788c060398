import { sql } from 'drizzle-orm';
import {
  type AnyPgColumn,
  bigserial,
  check,
  date,
  doublePrecision,
  index,
  integer,
  jsonb,
  pgTable,
  primaryKey,
  text,
  uniqueIndex,
  uuid,
} from 'drizzle-orm/pg-core';
import { user } from './auth';
import { at, createdAt, stamps } from './columns';

/** A row's own key: a random uuid. */
const id = () => uuid('id').primaryKey().defaultRandom();
/** A required link to the row of another table that this one is part of: deleted with it. */
const partOf = (name: string, target: () => AnyPgColumn) =>
  uuid(name).notNull().references(target, { onDelete: 'cascade' });
/**
 * A person's account: by default it cannot be deleted while named here; `set null` forgets them, `cascade`
 * (a membership) goes with them.
 */
const account = (name: string, onDelete?: 'set null' | 'cascade') =>
  text(name).references(() => user.id, onDelete && { onDelete });
const projectId = () => partOf('project_id', () => projects.id);
const organisationId = () => partOf('organisation_id', () => organisations.id);
/** Who made the row and when. */
const created = (onDelete?: 'set null') => ({
  createdBy: account('created_by', onDelete),
  createdAt: createdAt(),
});
/** Who made the row, when, and when it last changed. */
const edited = (onDelete?: 'set null') => ({
  createdBy: account('created_by', onDelete),
  ...stamps(),
});
/** Optimistic concurrency: every update names the `version` it read; with who made the row and when. */
const versioned = (onDelete?: 'set null') => ({
  version: integer('version').notNull().default(1),
  ...edited(onDelete),
});
/** A firm library entry's key and firm. */
const firmEntry = () => ({ id: id(), organisationId: organisationId() });
/** The assembly revision a run, a sweep or an inspection was made of, in its project. */
const ofAssembly = () => ({
  projectId: projectId(),
  assemblyId: partOf('assembly_id', () => assemblies.id),
  assemblyRevision: integer('assembly_revision').notNull(),
});
/** The code table version a run or a sweep was checked against, with its name as it was then. */
const checkedAgainst = () => ({
  criteriaSetId: uuid('criteria_set_id')
    .notNull()
    .references(() => criteriaSets.id),
  criteriaSetVersion: integer('criteria_set_version').notNull(),
  criteriaSetName: text('criteria_set_name').notNull(),
});
/** The firm that issued a verification code, as it was named then (the firm may go; its name stays). */
const issuer = () => ({
  issuerOrganisationId: uuid('issuer_organisation_id').references(() => organisations.id, {
    onDelete: 'set null',
  }),
  issuerName: text('issuer_name').notNull(),
});
const issuedAt = () => at('issued_at').notNull().defaultNow();
/** A decision with its note and time (null before there is one). */
const decided = () => ({
  decision: text('decision'),
  decisionNote: text('decision_note'),
  decidedAt: at('decided_at'),
});

/** A firm: the architect's, the engineer's, the cladding subcontractor's… */
export const organisations = pgTable('organisations', {
  id: id(),
  name: text('name').notNull(),
  /** The firm's handle (`@slug`): unique, never changed; names are not unique, so sheets print this too. */
  slug: text('slug').notNull().unique(),
  createdAt: createdAt(),
  /** When and by which site administrator the firm was confirmed to be who its name says (null: not verified). */
  verifiedAt: at('verified_at'),
  verifiedBy: account('verified_by', 'set null'),
});

export const organisationMembers = pgTable(
  'organisation_members',
  {
    organisationId: organisationId(),
    userId: account('user_id', 'cascade').notNull(),
    /**
     * The firm role (shared/auth/permissions.ts `FIRM_ROLES`): `admin` — members, roles, deletes; `editor` —
     * writes code tables, library entries and data sheets; `reader` — reads them.
     */
    role: text('role').notNull().default('reader'),
    createdAt: createdAt(),
  },
  (t) => [
    primaryKey({ columns: [t.organisationId, t.userId] }),
    index('org_members_user_idx').on(t.userId),
    check('org_members_role_check', sql`${t.role} in ('admin', 'editor', 'reader')`),
  ],
);

/** A building project; its site fields are what the later checks read. SI units in every column. */
export const projects = pgTable(
  'projects',
  {
    id: id(),
    organisationId: uuid('organisation_id')
      .notNull()
      .references(() => organisations.id),
    name: text('name').notNull(),
    number: text('number').notNull().default(''),
    description: text('description').notNull().default(''),
    siteAddress: text('site_address').notNull().default(''),
    /** ASHRAE 169 climate zone designation, e.g. `5A`. */
    climateZone: text('climate_zone').notNull(),
    /** Ground elevation above sea level, m. */
    elevationM: doublePrecision('elevation_m').notNull().default(0),
    /** Mean roof height, m. */
    buildingHeightM: doublePrecision('building_height_m').notNull(),
    planLengthM: doublePrecision('plan_length_m').notNull(),
    planWidthM: doublePrecision('plan_width_m').notNull(),
    indoorTempC: doublePrecision('indoor_temp_c').notNull(),
    /** Indoor design relative humidity, 0–1. */
    indoorRh: doublePrecision('indoor_rh').notNull(),
    winterDesignTempC: doublePrecision('winter_design_temp_c').notNull(),
    summerDesignTempC: doublePrecision('summer_design_temp_c').notNull(),
    /** ASCE 7 site parameters (shared/schemas/project.ts projectWindSchema), null until entered. */
    wind: jsonb('wind'),
    /** Twelve monthly exterior climates and their source (projectClimateSchema), null until entered. */
    climate: jsonb('climate'),
    archivedAt: at('archived_at'),
    /** Optimistic-concurrency version: every update must name the version it read. */
    version: integer('version').notNull().default(1),
    /**
     * The `version` each part — site data, wind data, climate — was last saved at: a save of one part conflicts
     * only with a later save of the same part, not with a colleague's save of another (projects.update).
     */
    siteSavedIn: integer('site_saved_in').notNull().default(1),
    windSavedIn: integer('wind_saved_in').notNull().default(1),
    climateSavedIn: integer('climate_saved_in').notNull().default(1),
    ...edited(),
  },
  (t) => [index('projects_org_idx').on(t.organisationId)],
);

/** Membership with a role per project; members may come from several firms. */
export const projectMembers = pgTable(
  'project_members',
  {
    id: id(),
    projectId: projectId(),
    userId: account('user_id', 'cascade').notNull(),
    role: text('role').notNull(),
    createdAt: createdAt(),
  },
  (t) => [
    uniqueIndex('project_members_unique').on(t.projectId, t.userId),
    index('project_members_user_idx').on(t.userId),
  ],
);

export const invitations = pgTable(
  'invitations',
  {
    id: id(),
    projectId: projectId(),
    email: text('email').notNull(),
    role: text('role').notNull(),
    /** SHA-256 of the token sent in the e-mail; the token itself is never stored. */
    tokenHash: text('token_hash').notNull().unique(),
    invitedBy: account('invited_by').notNull(),
    expiresAt: at('expires_at').notNull(),
    acceptedAt: at('accepted_at'),
    acceptedBy: account('accepted_by'),
    createdAt: createdAt(),
  },
  (t) => [index('invitations_project_idx').on(t.projectId)],
);

/** Who changed what, when — append-only. */
export const auditLog = pgTable(
  'audit_log',
  {
    id: bigserial('id', { mode: 'number' }).primaryKey(),
    at: at('at').notNull().defaultNow(),
    actorId: account('actor_id'),
    projectId: uuid('project_id').references(() => projects.id, { onDelete: 'cascade' }),
    entity: text('entity').notNull(),
    entityId: text('entity_id').notNull(),
    action: text('action').notNull(),
    before: jsonb('before'),
    after: jsonb('after'),
  },
  (t) => [index('audit_project_idx').on(t.projectId, t.at)],
);

/** Messages captured by the local SMTP fake (demo/dev/test); a real SMTP server is used in production. */
export const capturedMail = pgTable('captured_mail', {
  id: id(),
  receivedAt: at('received_at').notNull().defaultNow(),
  from: text('from').notNull(),
  to: text('to').notNull(),
  subject: text('subject').notNull(),
  text: text('text').notNull(),
  html: text('html'),
});

/** A wall assembly of a project; its content lives in revisions (each save is one). */
export const assemblies = pgTable(
  'assemblies',
  {
    id: id(),
    projectId: projectId(),
    name: text('name').notNull(),
    wallCategory: text('wall_category').notNull(),
    currentRevision: integer('current_revision').notNull().default(1),
    ...versioned(),
  },
  (t) => [index('assemblies_project_idx').on(t.projectId)],
);

/** Immutable revision of an assembly: its input and the result the engine of that day produced. */
export const assemblyRevisions = pgTable(
  'assembly_revisions',
  {
    id: id(),
    assemblyId: partOf('assembly_id', () => assemblies.id),
    revision: integer('revision').notNull(),
    note: text('note').notNull().default(''),
    input: jsonb('input').notNull(),
    thermalResult: jsonb('thermal_result'),
    engineVersion: text('engine_version').notNull(),
    ...created(),
  },
  (t) => [uniqueIndex('assembly_revisions_unique').on(t.assemblyId, t.revision)],
);

/** An organisation's own materials (λ, ρ, μ) with their source. */
export const orgMaterials = pgTable(
  'org_materials',
  {
    ...firmEntry(),
    name: text('name').notNull(),
    conductivity: doublePrecision('conductivity').notNull(),
    density: doublePrecision('density'),
    vapourResistanceFactor: doublePrecision('vapour_resistance_factor'),
    source: text('source').notNull(),
    createdAt: createdAt(),
  },
  (t) => [index('org_materials_org_idx').on(t.organisationId)],
);

/** An organisation's own library of χ (W/K) and ψ (W/(m·K)) values with their source. */
export const orgBridgeValues = pgTable(
  'org_bridge_values',
  {
    ...firmEntry(),
    name: text('name').notNull(),
    kind: text('kind').notNull(),
    value: doublePrecision('value').notNull(),
    sourceType: text('source_type').notNull(),
    source: text('source').notNull(),
    notes: text('notes').notNull().default(''),
    /** A computed value's detail, solve and map (shared/calc/bridge/computed.ts); null when entered. */
    computed: jsonb('computed'),
    createdAt: createdAt(),
  },
  (t) => [index('org_bridge_values_org_idx').on(t.organisationId)],
);

/**
 * A firm's attachment data for the wind check: a panel's load–span table (`kind` panel) or a clip's
 * allowable load (`kind` clip), the values in `data` (validated by shared/schemas/attachment-library.ts),
 * with their source and, once uploaded, the maker's data sheet in object storage under `dataSheetKey`.
 */
export const orgAttachmentProducts = pgTable(
  'org_attachment_products',
  {
    ...firmEntry(),
    kind: text('kind').notNull(),
    name: text('name').notNull(),
    source: text('source').notNull(),
    notes: text('notes').notNull().default(''),
    data: jsonb('data').notNull(),
    dataSheetKey: text('data_sheet_key'),
    dataSheetName: text('data_sheet_name'),
    dataSheetType: text('data_sheet_type'),
    dataSheetSize: integer('data_sheet_size'),
    dataSheetSha256: text('data_sheet_sha256'),
    dataSheetUploadedAt: at('data_sheet_uploaded_at'),
    ...created('set null'),
  },
  (t) => [index('org_attachment_products_org_idx').on(t.organisationId, t.kind)],
);

/**
 * A firm's cost of one thing a sweep varies (shared/schemas/sweeps.ts): insulation per m² of wall per 25 mm of
 * thickness, a clip each, girt and sealant per m (sealant per movement class), in the entry's currency.
 */
export const orgSweepCosts = pgTable(
  'org_sweep_costs',
  {
    ...firmEntry(),
    kind: text('kind').notNull(),
    name: text('name').notNull(),
    cost: doublePrecision('cost').notNull(),
    currency: text('currency').notNull(),
    movementClass: text('movement_class'),
    source: text('source').notNull().default(''),
    notes: text('notes').notNull().default(''),
    ...versioned('set null'),
  },
  (t) => [
    index('org_sweep_costs_org_idx').on(t.organisationId, t.kind),
    check('org_sweep_costs_kind', sql`${t.kind} in ('insulation', 'clip', 'girt', 'sealant')`),
  ],
);

/**
 * A firm's code table ("criteria set"), one row per version. Versions of one table share `lineageId` (the
 * id of version 1). A version used by a stored check run is frozen (`frozenAt`) and never changes again:
 * editing it creates version + 1 with `previousVersionId` pointing back. `revision` counts in-place edits
 * of an unfrozen version (optimistic concurrency).
 */
export const criteriaSets = pgTable(
  'criteria_sets',
  {
    ...firmEntry(),
    lineageId: uuid('lineage_id').notNull(),
    version: integer('version').notNull().default(1),
    previousVersionId: uuid('previous_version_id').references((): AnyPgColumn => criteriaSets.id),
    revision: integer('revision').notNull().default(1),
    name: text('name').notNull(),
    jurisdiction: text('jurisdiction').notNull().default(''),
    edition: text('edition').notNull().default(''),
    effectiveDate: date('effective_date', { mode: 'string' }),
    notes: text('notes').notNull().default(''),
    sourceReference: text('source_reference').notNull().default(''),
    /** The table's own names of the wall categories (shared/checks/criteria.ts categoryLabelsSchema). */
    categoryLabels: jsonb('category_labels').notNull().default({}),
    frozenAt: at('frozen_at'),
    ...edited(),
  },
  (t) => [
    uniqueIndex('criteria_sets_lineage_version').on(t.lineageId, t.version),
    index('criteria_sets_org_idx').on(t.organisationId),
  ],
);

/** One criterion of a code table version: zone (or `*`) × wall category × criterion type, SI value. */
export const criteriaRows = pgTable(
  'criteria_rows',
  {
    id: id(),
    setId: partOf('set_id', () => criteriaSets.id),
    position: integer('position').notNull(),
    climateZone: text('climate_zone').notNull(),
    wallCategory: text('wall_category').notNull(),
    criterion: text('criterion').notNull(),
    /** SI value; yes/no criteria store 1/0. */
    value: doublePrecision('value').notNull(),
    note: text('note').notNull().default(''),
  },
  (t) => [uniqueIndex('criteria_rows_key').on(t.setId, t.climateZone, t.wallCategory, t.criterion)],
);

/**
 * An issued compliance run, immutable: what it read (assembly revision and input, the project's site, wind
 * and climate data, the code table version and rows), what it found (module results with traces, checks,
 * verdict), the engine version, who and when, and SHA-256 hashes of the canonical JSON.
 */
export const checkRuns = pgTable(
  'check_runs',
  {
    id: id(),
    ...ofAssembly(),
    assemblyName: text('assembly_name').notNull(),
    ...checkedAgainst(),
    verdict: text('verdict').notNull(),
    criteriaVerdict: text('criteria_verdict').notNull(),
    moduleVerdict: text('module_verdict').notNull(),
    passCount: integer('pass_count').notNull(),
    failCount: integer('fail_count').notNull(),
    notEvaluatedCount: integer('not_evaluated_count').notNull(),
    engineVersion: text('engine_version').notNull(),
    inputs: jsonb('inputs').notNull(),
    outputs: jsonb('outputs').notNull(),
    inputsHash: text('inputs_hash').notNull(),
    outputsHash: text('outputs_hash').notNull(),
    hash: text('hash').notNull(),
    ...created(),
  },
  (t) => [
    index('check_runs_project_idx').on(t.projectId, t.createdAt),
    index('check_runs_assembly_idx').on(t.assemblyId),
  ],
);

/**
 * A saved sweep of an assembly: the revision and code table version it ran against, what it varied, the costs
 * it ranked by, and a summary of its results (shared/schemas/sweeps.ts) — not every variant.
 */
export const assemblySweeps = pgTable(
  'assembly_sweeps',
  {
    id: id(),
    ...ofAssembly(),
    name: text('name').notNull(),
    ...checkedAgainst(),
    parameters: jsonb('parameters').notNull(),
    costs: jsonb('costs'),
    summary: jsonb('summary').notNull(),
    engineVersion: text('engine_version').notNull(),
    ...created('set null'),
  },
  (t) => [index('assembly_sweeps_assembly_idx').on(t.assemblyId, t.createdAt)],
);

/**
 * A compliance sheet's verification code (shared/sheets/verification.ts: the first 10 base32 characters of
 * the run's SHA-256 hash), recorded when a sheet is first issued (rendered or attached to a submittal),
 * with the issuing firm as it was named then. The hash covers the run's content, not its time, so runs of
 * identical inputs share a code: the row keeps the first run issued with it. The public /verify page looks
 * codes up here (primary key).
 */
export const sheetVerifications = pgTable(
  'sheet_verifications',
  {
    code: text('code').primaryKey(),
    runId: partOf('run_id', () => checkRuns.id),
    ...issuer(),
    issuedAt: issuedAt(),
  },
  (t) => [uniqueIndex('sheet_verifications_run').on(t.runId)],
);

/**
 * A field report's verification code (the first 10 base32 characters of the SHA-256 of the inspection as
 * printed and its photos' hashes), recorded the first time a report with that content is printed, with the
 * project's firm as it was named then and what the report showed (`summary`: the inspection's number, title,
 * scope, status and counts, shared/schemas/sheets.ts fieldReportVerificationSchema). /verify looks codes up
 * here when no compliance sheet has them.
 */
export const fieldReportVerifications = pgTable('field_report_verifications', {
  code: text('code').primaryKey(),
  inspectionId: partOf('inspection_id', () => inspections.id),
  hash: text('hash').notNull(),
  ...issuer(),
  issuedBy: account('issued_by', 'set null'),
  summary: jsonb('summary').notNull(),
  issuedAt: issuedAt(),
});

/**
 * One revision of a submittal. Revisions of one submittal share `lineageId` (the id of revision 1) and its
 * number; "revise and resubmit" closes a revision and opens `revision + 1` (`previousRevisionId`). A
 * decided revision never changes again. `version` counts edits (optimistic concurrency).
 */
export const submittals = pgTable(
  'submittals',
  {
    id: id(),
    projectId: projectId(),
    lineageId: uuid('lineage_id').notNull(),
    previousRevisionId: uuid('previous_revision_id').references((): AnyPgColumn => submittals.id),
    revision: integer('revision').notNull().default(1),
    number: text('number').notNull(),
    title: text('title').notNull(),
    description: text('description').notNull().default(''),
    /** CSI MasterFormat section number and title, e.g. `07 42 13` "Metal Wall Panels". */
    specSection: text('spec_section').notNull(),
    specTitle: text('spec_title').notNull(),
    dueDate: date('due_date', { mode: 'string' }),
    /** draft | submitted | under_review | approved | approved_as_noted | revise_and_resubmit | rejected */
    status: text('status').notNull().default('draft'),
    /** The person on the submitting side (creator of revision 1; carried to later revisions). */
    submitterId: account('submitter_id'),
    submittedAt: at('submitted_at'),
    submittedBy: account('submitted_by'),
    ...decided(),
    decidedBy: account('decided_by'),
    ...versioned(),
  },
  (t) => [
    index('submittals_project_idx').on(t.projectId, t.status),
    uniqueIndex('submittals_lineage_revision').on(t.lineageId, t.revision),
    uniqueIndex('submittals_project_number_revision').on(t.projectId, t.number, t.revision),
  ],
);

/**
 * Reviewers named on a submittal revision (project members whose role allows reviewing), each with their own
 * decision and note once they have decided (null before). The revision closes when every one has decided.
 */
export const submittalReviewers = pgTable(
  'submittal_reviewers',
  {
    submittalId: partOf('submittal_id', () => submittals.id),
    userId: account('user_id', 'cascade').notNull(),
    /** approved | approved_as_noted | revise_and_resubmit | rejected */
    ...decided(),
  },
  (t) => [primaryKey({ columns: [t.submittalId, t.userId] })],
);

/**
 * An item of a submittal revision: a compliance sheet (a stored check run) or an uploaded file. A file's
 * bytes live in object storage under `storageKey` (a uuid path of ours); its display name is sanitised and
 * its content type detected from the bytes. Revisions opened by "revise and resubmit" start with copies of
 * the items, which point at the same stored objects (never changed, so they can be shared).
 */
export const submittalItems = pgTable(
  'submittal_items',
  {
    id: id(),
    submittalId: partOf('submittal_id', () => submittals.id),
    position: integer('position').notNull(),
    /** sheet | file */
    kind: text('kind').notNull(),
    checkRunId: uuid('check_run_id').references(() => checkRuns.id, { onDelete: 'cascade' }),
    storageKey: text('storage_key'),
    fileName: text('file_name'),
    contentType: text('content_type'),
    size: integer('size'),
    sha256: text('sha256'),
    addedBy: account('added_by'),
    createdAt: createdAt(),
  },
  // One item per place: racing additions cannot share a position (they are also serialised by a row lock).
  (t) => [uniqueIndex('submittal_items_position_unique').on(t.submittalId, t.position)],
);

/** Review comments on a submittal revision or on one of its items. */
export const submittalComments = pgTable(
  'submittal_comments',
  {
    id: id(),
    submittalId: partOf('submittal_id', () => submittals.id),
    itemId: uuid('item_id').references(() => submittalItems.id, { onDelete: 'cascade' }),
    authorId: account('author_id'),
    body: text('body').notNull(),
    createdAt: createdAt(),
  },
  (t) => [index('submittal_comments_submittal_idx').on(t.submittalId, t.createdAt)],
);

/**
 * A firm's checklist template (D-025): items added to every inspection checklist generated for its projects.
 * Versioned like the code tables: a version used by an inspection is frozen (`frozenAt`), and editing it makes
 * `version + 1`; an unfrozen version is edited in place under `revision`.
 */
export const inspectionTemplates = pgTable(
  'inspection_templates',
  {
    ...firmEntry(),
    version: integer('version').notNull().default(1),
    previousVersionId: uuid('previous_version_id').references((): AnyPgColumn => inspectionTemplates.id),
    /** shared/inspections/schema.ts templateItemSchema[] */
    items: jsonb('items').notNull().default([]),
    revision: integer('revision').notNull().default(1),
    frozenAt: at('frozen_at'),
    ...edited(),
  },
  (t) => [uniqueIndex('inspection_templates_org_version').on(t.organisationId, t.version)],
);

/**
 * A field inspection of one assembly revision over part of the building (elevation and a grid range or wind
 * zone), numbered within its project. `version` counts changes of the inspection itself (closing);
 * each item has its own version.
 */
export const inspections = pgTable(
  'inspections',
  {
    id: id(),
    projectId: projectId(),
    number: integer('number').notNull(),
    title: text('title').notNull(),
    assemblyId: partOf('assembly_id', () => assemblies.id),
    assemblyRevision: integer('assembly_revision').notNull(),
    assemblyName: text('assembly_name').notNull(),
    elevation: text('elevation').notNull(),
    /** shared/inspections/schema.ts inspectionAreaSchema */
    area: jsonb('area').notNull(),
    /** in_progress | closed */
    status: text('status').notNull().default('in_progress'),
    checkRunId: uuid('check_run_id').references(() => checkRuns.id, { onDelete: 'set null' }),
    sheetCode: text('sheet_code'),
    templateId: uuid('template_id').references(() => inspectionTemplates.id, { onDelete: 'set null' }),
    ...versioned(),
    closedAt: at('closed_at'),
    closedBy: account('closed_by'),
  },
  (t) => [
    uniqueIndex('inspections_project_number').on(t.projectId, t.number),
    check('inspections_status', sql`${t.status} in ('in_progress', 'closed')`),
  ],
);

/** A checklist item: its design value (SI), limits and source as generated, and its answer (own version). */
export const inspectionItems = pgTable(
  'inspection_items',
  {
    id: id(),
    inspectionId: partOf('inspection_id', () => inspections.id),
    position: integer('position').notNull(),
    kind: text('kind').notNull(),
    itemGroup: text('item_group').notNull(),
    label: text('label').notNull(),
    designText: text('design_text').notNull(),
    quantity: text('quantity'),
    designValue: doublePrecision('design_value'),
    /** shared/inspections/schema.ts toleranceSchema, or null */
    tolerance: jsonb('tolerance'),
    /** shared/inspections/schema.ts itemSourceSchema */
    source: jsonb('source').notNull(),
    /** unseen | pass | fail | na */
    state: text('state').notNull().default('unseen'),
    measured: doublePrecision('measured'),
    note: text('note').notNull().default(''),
    location: text('location').notNull().default(''),
    version: integer('version').notNull().default(1),
    answeredBy: account('answered_by'),
    answeredAt: at('answered_at'),
  },
  (t) => [
    uniqueIndex('inspection_items_position').on(t.inspectionId, t.position),
    check('inspection_items_state', sql`${t.state} in ('unseen', 'pass', 'fail', 'na')`),
  ],
);

/** A photo of an item, stored in object storage under `storageKey` (a uuid path of ours). */
export const inspectionPhotos = pgTable(
  'inspection_photos',
  {
    id: id(),
    inspectionId: partOf('inspection_id', () => inspections.id),
    itemId: partOf('item_id', () => inspectionItems.id),
    storageKey: text('storage_key').notNull(),
    fileName: text('file_name').notNull(),
    contentType: text('content_type').notNull(),
    size: integer('size').notNull(),
    sha256: text('sha256').notNull(),
    ...created(),
  },
  (t) => [index('inspection_photos_item_idx').on(t.itemId)],
);

/** A deficiency opened by a failed item: open → corrected (with a photo) → accepted, or reopened. */
export const inspectionDeficiencies = pgTable(
  'inspection_deficiencies',
  {
    id: id(),
    inspectionId: partOf('inspection_id', () => inspections.id),
    itemId: partOf('item_id', () => inspectionItems.id),
    number: integer('number').notNull(),
    /** open | corrected | accepted | reopened */
    state: text('state').notNull().default('open'),
    description: text('description').notNull().default(''),
    ownerId: account('owner_id', 'set null'),
    dueDate: date('due_date', { mode: 'string' }),
    correctionPhotoId: uuid('correction_photo_id').references(() => inspectionPhotos.id, {
      onDelete: 'set null',
    }),
    note: text('note').notNull().default(''),
    ...versioned(),
  },
  (t) => [
    uniqueIndex('inspection_deficiencies_number').on(t.inspectionId, t.number),
    index('inspection_deficiencies_item_idx').on(t.itemId),
    check('inspection_deficiencies_state', sql`${t.state} in ('open', 'corrected', 'accepted', 'reopened')`),
  ],
);
