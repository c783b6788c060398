import type { z } from 'zod';
import { wordedEnum } from '../schemas/common';

/**
 * Roles on a project. One project is shared by people of several firms, each with a role on that project.
 * `owner` is the project administrator (usually the architect's firm that created it).
 */
export const [PROJECT_ROLES, projectRoleSchema, PROJECT_ROLE_LABELS] = wordedEnum({
  owner: 'Owner / admin',
  architect: 'Architect',
  envelope_consultant: 'Envelope consultant',
  engineer: 'Engineer',
  subcontractor: 'Cladding subcontractor',
  viewer: 'Viewer',
});
export type ProjectRole = z.infer<typeof projectRoleSchema>;

const ALL: readonly ProjectRole[] = PROJECT_ROLES;
const DESIGNERS: readonly ProjectRole[] = ['owner', 'architect', 'envelope_consultant', 'engineer'];
const REVIEWERS: readonly ProjectRole[] = ['architect', 'envelope_consultant', 'engineer'];
const INSPECTORS: readonly ProjectRole[] = ['envelope_consultant', 'engineer'];
const INSPECTORS_AND_CREW: readonly ProjectRole[] = [...INSPECTORS, 'subcontractor'];

/**
 * The one permission table: every action that a route or a button can take on a project, and the roles that
 * may take it. The server enforces it on every project route; the client uses the same table to hide what a
 * role cannot do.
 */
export const PERMISSIONS = {
  'project.read': ALL,
  'project.update': ['owner', 'architect'],
  'project.archive': ['owner'],
  'project.wind.update': ['owner', 'architect', 'engineer'],
  'project.climate.update': ['owner', 'architect', 'envelope_consultant'],
  'members.read': ALL,
  'members.invite': ['owner', 'architect'],
  'members.manage': ['owner'],
  'audit.read': ['owner', 'architect', 'envelope_consultant', 'engineer'],
  'assembly.read': ALL,
  'assembly.write': DESIGNERS,
  'checkrun.create': [...DESIGNERS, 'subcontractor'],
  'submittal.create': ['owner', 'subcontractor'],
  'submittal.submit': ['owner', 'subcontractor'],
  'submittal.review': REVIEWERS,
  'submittal.read': ALL,
  'submittal.comment': [...DESIGNERS, 'subcontractor'],
  // Field inspections (D-025): the crew fills and corrects, the inspectors inspect, accept and reopen, the
  // owner and architect read and close.
  'inspection.read': ALL,
  'inspection.create': INSPECTORS_AND_CREW,
  'inspection.answer': INSPECTORS_AND_CREW,
  'inspection.close': DESIGNERS,
  'deficiency.correct': ['subcontractor'],
  'deficiency.review': INSPECTORS,
} as const satisfies Record<string, readonly ProjectRole[]>;
export type ProjectAction = keyof typeof PERMISSIONS;
const PROJECT_ACTIONS = Object.keys(PERMISSIONS) as ProjectAction[];

/**
 * Actions that are a duty on site, not a power over the design: left out of the grant rule, so an architect
 * still appoints the envelope consultant and the engineer who inspect the wall (D-025).
 */
const FIELD_ACTIONS: readonly ProjectAction[] = [
  'inspection.create',
  'inspection.answer',
  'deficiency.correct',
  'deficiency.review',
];

export function can(role: ProjectRole | null | undefined, action: ProjectAction): boolean {
  return role != null && (PERMISSIONS[action] as readonly ProjectRole[]).includes(role);
}

/**
 * Who may hand out which project role — invite someone with it, or change a member to it (`current`: the
 * member's role now; null for an invitation). The one rule, used by the server and by the forms:
 * - an owner may grant every role, to anyone;
 * - anyone else may grant only a role that can do nothing their own role cannot (each of its actions is one
 *   of theirs) — so never owner — and may not change an owner.
 * So an architect may invite architects, envelope consultants, engineers and viewers, but neither an owner
 * nor a cladding subcontractor (who submits the submittals the architect reviews: the reviewing side does not
 * create the submitting side).
 */
export function mayGrant(
  granter: ProjectRole | null | undefined,
  role: ProjectRole,
  current: ProjectRole | null = null,
): boolean {
  if (granter == null) return false;
  if (granter === 'owner') return true;
  if (current === 'owner') return false;
  return PROJECT_ACTIONS.every(
    (action) => FIELD_ACTIONS.includes(action) || !can(role, action) || can(granter, action),
  );
}

/** The roles `granter` may give someone whose role is `current` (null: a new invitation), in table order. */
export const grantableRoles = (
  granter: ProjectRole | null | undefined,
  current: ProjectRole | null = null,
): ProjectRole[] => PROJECT_ROLES.filter((role) => mayGrant(granter, role, current));

/** Whether `remover` may take a member whose role is `current` off the project: only an owner removes an owner. */
export const mayRemove = (remover: ProjectRole | null | undefined, current: ProjectRole): boolean =>
  remover != null && (remover === 'owner' || current !== 'owner');

/**
 * Roles in a firm (`organisation_members.role`), separate from project roles: the firm's own data — its code
 * tables, library entries (materials, χ/ψ values, panel tables and clips) and makers' data sheets — is shared
 * by all its projects, so only the firm decides who writes it. `admin`: the firm administrator (members and
 * their firm roles, deleting entries and tables); `editor`: writes code tables, library entries and data
 * sheets; `reader`: reads them. A project role never writes a firm's data.
 */
export const [FIRM_ROLES, firmRoleSchema, FIRM_ROLE_LABELS] = wordedEnum({
  admin: 'Firm administrator',
  editor: 'Editor',
  reader: 'Reader',
});
export type FirmRole = z.infer<typeof firmRoleSchema>;

/** What a firm role allows, in the firm's own data. */
export const FIRM_PERMISSIONS = {
  /** Read the libraries, the code tables and the list of members. */
  'firm.read': FIRM_ROLES,
  /** Add library entries and upload data sheets; create and edit code tables. */
  'firm.write': ['admin', 'editor'],
  /** Delete library entries and code tables; add, change and remove members. */
  'firm.admin': ['admin'],
} as const satisfies Record<string, readonly FirmRole[]>;
export type FirmAction = keyof typeof FIRM_PERMISSIONS;

export function canInFirm(role: FirmRole | null | undefined, action: FirmAction): boolean {
  return role != null && (FIRM_PERMISSIONS[action] as readonly FirmRole[]).includes(role);
}

/** Site-wide roles: `admin` runs the installation (mail outbox, every firm); `user` otherwise. */
export const SITE_ROLES = ['admin', 'user'] as const;
export type SiteRole = (typeof SITE_ROLES)[number];
