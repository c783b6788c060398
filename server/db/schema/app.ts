import {
  bigserial,
  doublePrecision,
  index,
  integer,
  jsonb,
  pgTable,
  primaryKey,
  text,
  timestamp,
  uniqueIndex,
  uuid,
} from 'drizzle-orm/pg-core';
import { user } from './auth';

const createdAt = () => timestamp('created_at', { withTimezone: true }).notNull().defaultNow();
const updatedAt = () => timestamp('updated_at', { withTimezone: true }).notNull().defaultNow();

/** A firm: the architect's, the engineer's, the cladding subcontractor's… */
export const organisations = pgTable('organisations', {
  id: uuid('id').primaryKey().defaultRandom(),
  name: text('name').notNull(),
  slug: text('slug').notNull().unique(),
  createdAt: createdAt(),
});

export const organisationMembers = pgTable(
  'organisation_members',
  {
    organisationId: uuid('organisation_id')
      .notNull()
      .references(() => organisations.id, { onDelete: 'cascade' }),
    userId: text('user_id')
      .notNull()
      .references(() => user.id, { onDelete: 'cascade' }),
    /** `admin` manages the firm's libraries and members; `member` otherwise. */
    role: text('role').notNull().default('member'),
    createdAt: createdAt(),
  },
  (t) => [primaryKey({ columns: [t.organisationId, t.userId] }), index('org_members_user_idx').on(t.userId)],
);

/** A building project; its site fields are what the later checks read. SI units in every column. */
export const projects = pgTable(
  'projects',
  {
    id: uuid('id').primaryKey().defaultRandom(),
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
    archivedAt: timestamp('archived_at', { withTimezone: true }),
    /** Optimistic-concurrency version: every update must name the version it read. */
    version: integer('version').notNull().default(1),
    createdBy: text('created_by').references(() => user.id),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index('projects_org_idx').on(t.organisationId)],
);

/** Membership with a role per project; members may come from several firms. */
export const projectMembers = pgTable(
  'project_members',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    projectId: uuid('project_id')
      .notNull()
      .references(() => projects.id, { onDelete: 'cascade' }),
    userId: text('user_id')
      .notNull()
      .references(() => user.id, { onDelete: 'cascade' }),
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
    id: uuid('id').primaryKey().defaultRandom(),
    projectId: uuid('project_id')
      .notNull()
      .references(() => projects.id, { onDelete: 'cascade' }),
    email: text('email').notNull(),
    role: text('role').notNull(),
    /** SHA-256 of the token sent in the e-mail; the token itself is never stored. */
    tokenHash: text('token_hash').notNull().unique(),
    invitedBy: text('invited_by')
      .notNull()
      .references(() => user.id),
    expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
    acceptedAt: timestamp('accepted_at', { withTimezone: true }),
    acceptedBy: text('accepted_by').references(() => user.id),
    createdAt: createdAt(),
  },
  (t) => [index('invitations_project_idx').on(t.projectId)],
);

/** Who changed what, when — append-only. */
export const auditLog = pgTable(
  'audit_log',
  {
    id: bigserial('id', { mode: 'number' }).primaryKey(),
    at: timestamp('at', { withTimezone: true }).notNull().defaultNow(),
    actorId: text('actor_id').references(() => user.id),
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
  id: uuid('id').primaryKey().defaultRandom(),
  receivedAt: timestamp('received_at', { withTimezone: true }).notNull().defaultNow(),
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
    id: uuid('id').primaryKey().defaultRandom(),
    projectId: uuid('project_id')
      .notNull()
      .references(() => projects.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    wallCategory: text('wall_category').notNull(),
    currentRevision: integer('current_revision').notNull().default(1),
    version: integer('version').notNull().default(1),
    createdBy: text('created_by').references(() => user.id),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index('assemblies_project_idx').on(t.projectId)],
);

/** Immutable revision of an assembly: its input and the result the engine of that day produced. */
export const assemblyRevisions = pgTable(
  'assembly_revisions',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    assemblyId: uuid('assembly_id')
      .notNull()
      .references(() => assemblies.id, { onDelete: 'cascade' }),
    revision: integer('revision').notNull(),
    note: text('note').notNull().default(''),
    input: jsonb('input').notNull(),
    thermalResult: jsonb('thermal_result'),
    engineVersion: text('engine_version').notNull(),
    createdBy: text('created_by').references(() => user.id),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex('assembly_revisions_unique').on(t.assemblyId, t.revision)],
);

/** An organisation's own materials (λ, ρ, μ) with their source. */
export const orgMaterials = pgTable(
  'org_materials',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    organisationId: uuid('organisation_id')
      .notNull()
      .references(() => organisations.id, { onDelete: 'cascade' }),
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
    id: uuid('id').primaryKey().defaultRandom(),
    organisationId: uuid('organisation_id')
      .notNull()
      .references(() => organisations.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    kind: text('kind').notNull(),
    value: doublePrecision('value').notNull(),
    sourceType: text('source_type').notNull(),
    source: text('source').notNull(),
    notes: text('notes').notNull().default(''),
    createdAt: createdAt(),
  },
  (t) => [index('org_bridge_values_org_idx').on(t.organisationId)],
);
