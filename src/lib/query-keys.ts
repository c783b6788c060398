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

/**
 * One resource's keys: all → lists → list(what narrows the list) and all → details → detail(id). `ListArgs` are
 * what `list` takes (a project's id by default).
 */
function resourceKeys<ListArgs extends unknown[] = [projectId: string]>(name: string) {
  const all = [name] as const;
  const lists = () => [...all, 'list'] as const;
  const details = () => [...all, 'detail'] as const;
  return {
    all,
    lists,
    list: (...args: ListArgs) => [...lists(), ...args] as const,
    details,
    detail: (id: string) => [...details(), id] as const,
  };
}

export const projectKeys = resourceKeys<[filter: ProjectListFilter]>('projects');
export const memberKeys = resourceKeys('members');
export const invitationKeys = resourceKeys('invitations');
export const auditKeys = resourceKeys('audit');
export const mailKeys = resourceKeys('admin-mail');
export const firmMemberKeys = resourceKeys<[orgId: string]>('firm-members');
export const adminOrganisationKeys = resourceKeys('admin-organisations');

const assemblies = resourceKeys('assemblies');
export const assemblyKeys = {
  ...assemblies,
  revisions: (assemblyId: string) => [...assemblies.detail(assemblyId), 'revisions'] as const,
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

const criteria = resourceKeys('criteria-sets');
export const criteriaKeys = {
  ...criteria,
  list: (orgId: string) => [...criteria.lists(), 'firm', orgId] as const,
  forProject: (projectId: string) => [...criteria.lists(), 'project', projectId] as const,
  versions: (setId: string) => [...criteria.all, 'versions', setId] as const,
  diff: (setId: string, from: number, to: number) => [...criteria.all, 'diff', setId, from, to] as const,
};

export const checkRunKeys = resourceKeys<[projectId: string, assemblyId: string | null]>('check-runs');

export type SubmittalListFilter = { status: string | null };

export const submittalKeys = resourceKeys<[projectId: string, filter: SubmittalListFilter]>('submittals');

export const verificationKeys = {
  all: ['sheet-verification'] as const,
  detail: (code: string) => [...verificationKeys.all, code] as const,
};

const inspections = resourceKeys('inspections');
export const inspectionKeys = {
  ...inspections,
  /** Mutations kept on the device and sent when the connection returns (src/lib/offline). */
  answers: () => [...inspections.all, 'answer'] as const,
  photos: () => [...inspections.all, 'photo'] as const,
};
