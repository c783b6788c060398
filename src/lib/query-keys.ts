/**
 * Query-key factories, one per resource ("effective query keys"): all → lists → list(filter) →
 * details → detail(id). Mutations invalidate by prefix. They live here, not inside each feature, so a
 * feature can invalidate another's cache (e.g. an edit invalidates the activity log) without importing it.
 */
export type ProjectListFilter = { archived: boolean };

export const meKeys = {
  all: ['me'] as const,
  current: () => [...meKeys.all, 'current'] as const,
};

export const projectKeys = {
  all: ['projects'] as const,
  lists: () => [...projectKeys.all, 'list'] as const,
  list: (filter: ProjectListFilter) => [...projectKeys.lists(), filter] as const,
  details: () => [...projectKeys.all, 'detail'] as const,
  detail: (id: string) => [...projectKeys.details(), id] as const,
};

export const memberKeys = {
  all: ['members'] as const,
  lists: () => [...memberKeys.all, 'list'] as const,
  list: (projectId: string) => [...memberKeys.lists(), projectId] as const,
};

export const invitationKeys = {
  all: ['invitations'] as const,
  details: () => [...invitationKeys.all, 'detail'] as const,
  detail: (token: string) => [...invitationKeys.details(), token] as const,
};

export const auditKeys = {
  all: ['audit'] as const,
  lists: () => [...auditKeys.all, 'list'] as const,
  list: (projectId: string) => [...auditKeys.lists(), projectId] as const,
};

export const mailKeys = {
  all: ['admin-mail'] as const,
  lists: () => [...mailKeys.all, 'list'] as const,
};

export const firmMemberKeys = {
  all: ['firm-members'] as const,
  lists: () => [...firmMemberKeys.all, 'list'] as const,
  list: (orgId: string) => [...firmMemberKeys.lists(), orgId] as const,
};

export const adminOrganisationKeys = {
  all: ['admin-organisations'] as const,
  lists: () => [...adminOrganisationKeys.all, 'list'] as const,
};

export const assemblyKeys = {
  all: ['assemblies'] as const,
  lists: () => [...assemblyKeys.all, 'list'] as const,
  list: (projectId: string) => [...assemblyKeys.lists(), projectId] as const,
  details: () => [...assemblyKeys.all, 'detail'] as const,
  detail: (assemblyId: string) => [...assemblyKeys.details(), assemblyId] as const,
  revisions: (assemblyId: string) => [...assemblyKeys.detail(assemblyId), 'revisions'] as const,
  revision: (assemblyId: string, revision: number) =>
    [...assemblyKeys.revisions(assemblyId), revision] as const,
};

export const libraryKeys = {
  all: ['library'] as const,
  reference: () => [...libraryKeys.all, 'reference-materials'] as const,
  materials: (orgId: string) => [...libraryKeys.all, 'materials', orgId] as const,
  bridgeValues: (orgId: string) => [...libraryKeys.all, 'bridge-values', orgId] as const,
  attachmentProducts: (orgId: string) => [...libraryKeys.all, 'attachment-products', orgId] as const,
  inspectionTemplate: (orgId: string) => [...libraryKeys.all, 'inspection-template', orgId] as const,
  sweepCosts: (orgId: string) => [...libraryKeys.all, 'sweep-costs', orgId] as const,
};

export const sweepKeys = {
  all: ['sweeps'] as const,
  list: (assemblyId: string) => [...sweepKeys.all, 'list', assemblyId] as const,
  detail: (sweepId: string) => [...sweepKeys.all, 'detail', sweepId] as const,
  compare: (assemblyId: string, from: string, to: string) =>
    [...sweepKeys.all, 'compare', assemblyId, from, to] as const,
};

export const criteriaKeys = {
  all: ['criteria-sets'] as const,
  lists: () => [...criteriaKeys.all, 'list'] as const,
  list: (orgId: string) => [...criteriaKeys.lists(), 'firm', orgId] as const,
  forProject: (projectId: string) => [...criteriaKeys.lists(), 'project', projectId] as const,
  details: () => [...criteriaKeys.all, 'detail'] as const,
  detail: (setId: string) => [...criteriaKeys.details(), setId] as const,
  versions: (setId: string) => [...criteriaKeys.all, 'versions', setId] as const,
  diff: (setId: string, from: number, to: number) => [...criteriaKeys.all, 'diff', setId, from, to] as const,
};

export const checkRunKeys = {
  all: ['check-runs'] as const,
  lists: () => [...checkRunKeys.all, 'list'] as const,
  list: (projectId: string, assemblyId: string | null) =>
    [...checkRunKeys.lists(), projectId, assemblyId] as const,
  details: () => [...checkRunKeys.all, 'detail'] as const,
  detail: (runId: string) => [...checkRunKeys.details(), runId] as const,
};

export type SubmittalListFilter = { status: string | null };

export const submittalKeys = {
  all: ['submittals'] as const,
  lists: () => [...submittalKeys.all, 'list'] as const,
  list: (projectId: string, filter: SubmittalListFilter) =>
    [...submittalKeys.lists(), projectId, filter] as const,
  details: () => [...submittalKeys.all, 'detail'] as const,
  detail: (submittalId: string) => [...submittalKeys.details(), submittalId] as const,
};

export const verificationKeys = {
  all: ['sheet-verification'] as const,
  detail: (code: string) => [...verificationKeys.all, code] as const,
};

export const inspectionKeys = {
  all: ['inspections'] as const,
  lists: () => [...inspectionKeys.all, 'list'] as const,
  list: (projectId: string) => [...inspectionKeys.lists(), projectId] as const,
  details: () => [...inspectionKeys.all, 'detail'] as const,
  detail: (inspectionId: string) => [...inspectionKeys.details(), inspectionId] as const,
  /** Mutations kept on the device and sent when the connection returns (src/lib/offline). */
  answers: () => [...inspectionKeys.all, 'answer'] as const,
  photos: () => [...inspectionKeys.all, 'photo'] as const,
};
