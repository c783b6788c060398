import { uuidParam } from '@shared/schemas/common';
import { normaliseVerificationCode } from '@shared/sheets/verification';
import type { EnsureQueryDataOptions, QueryClient } from '@tanstack/react-query';
import { data, type LoaderFunctionArgs, redirect } from 'react-router';
import { mailQueryOptions } from '../features/admin-mail/api/get-mail';
import { organisationsQueryOptions } from '../features/admin-organisations/api/get-organisations';
import { assembliesQueryOptions } from '../features/assemblies/api/get-assemblies';
import { assemblyQueryOptions } from '../features/assemblies/api/get-assembly';
import { revisionQueryOptions } from '../features/assemblies/api/get-revision';
import { revisionsQueryOptions } from '../features/assemblies/api/get-revisions';
import { auditQueryOptions } from '../features/audit/api/get-audit';
import { checkRunQueryOptions } from '../features/checks/api/get-check-run';
import { checkRunsQueryOptions } from '../features/checks/api/get-check-runs';
import { criteriaDiffQueryOptions } from '../features/criteria/api/get-criteria-diff';
import { criteriaSetQueryOptions } from '../features/criteria/api/get-criteria-set';
import { criteriaSetsQueryOptions } from '../features/criteria/api/get-criteria-sets';
import { criteriaVersionsQueryOptions } from '../features/criteria/api/get-criteria-versions';
import { projectCriteriaSetsQueryOptions } from '../features/criteria/api/get-project-criteria-sets';
import { firmMembersQueryOptions } from '../features/firm-members/api/get-firm-members';
import { inspectionQueryOptions } from '../features/inspections/api/get-inspection';
import { inspectionsQueryOptions } from '../features/inspections/api/get-inspections';
import { invitationQueryOptions } from '../features/invitations/api/get-invitation';
import { attachmentProductsQueryOptions } from '../features/library/api/attachment-products';
import { bridgeValuesQueryOptions, firmMaterialsQueryOptions } from '../features/library/api/firm-lists';
import { referenceMaterialsQueryOptions } from '../features/library/api/get-reference-materials';
import { meQueryOptions } from '../features/me/api/get-me';
import { firmOf } from '../features/me/firm';
import { membersQueryOptions } from '../features/members/api/get-members';
import { projectQueryOptions } from '../features/projects/api/get-project';
import { projectsQueryOptions } from '../features/projects/api/get-projects';
import { verificationQueryOptions } from '../features/sheets/api/get-verification';
import { submittalQueryOptions } from '../features/submittals/api/get-submittal';
import { submittalsQueryOptions } from '../features/submittals/api/get-submittals';
import { signInPath } from '../lib/safe-next';
import { diffVersionsOf, revisionOf, submittalStatusOf } from './route-params';

type Loader = (args: LoaderFunctionArgs) => Promise<null> | null;
// biome-ignore lint/suspicious/noExplicitAny: the options of any query (each is typed where it is built)
type AnyQuery = EnsureQueryDataOptions<any, any, any, any>;

/**
 * The loaders of the routes (src/app/router.tsx). Each fills the query cache with the same `queryOptions` its
 * page's hooks use (`ensureQueryData`: cached data is used as it is, the page's hook refreshes it), so the page
 * draws at once from the cache, and they run while the page's own chunk downloads. Two kinds:
 * - `need`: the record the address names (the project, the assembly) — a failure is the route's error, so a
 *   wrong address is the 404 page;
 * - `warm`: everything else the page reads — a failure is left to the page, which says what failed in place.
 */
export function createLoaders(queryClient: QueryClient) {
  const need = queryClient.ensureQueryData.bind(queryClient);
  const warm = async (...options: AnyQuery[]) => {
    await Promise.all(options.map((o) => queryClient.ensureQueryData(o).catch(() => undefined)));
    return null;
  };
  const me = () => need(meQueryOptions());
  const search = (request: Request) => new URL(request.url).searchParams;
  const idOf = (value: string | undefined, what: string) => {
    if (!uuidParam.safeParse({ id: value }).success) throw data(`No such ${what}.`, { status: 404 });
    return value as string;
  };
  /**
   * The loaders of pages for a signed-in person: they run beside the session check, so they ask for nothing
   * while no one is signed in (the session loader sends the person to sign in).
   */
  const signedIn = <K extends string>(loaders: Record<K, Loader>) =>
    Object.fromEntries(
      Object.entries<Loader>(loaders).map(([name, loader]) => [
        name,
        (async (args) => ((await me()) ? loader(args) : null)) satisfies Loader,
      ]),
    ) as Record<K, Loader>;
  /** The site administrators' pages: anyone else is not allowed. */
  const siteAdmin = async () => {
    if ((await me())?.siteRole !== 'admin')
      throw data('This page is for site administrators.', { status: 403 });
  };
  /** The firm library the build-up pages offer: of the project's firm when the person belongs to it. */
  const builderLibrary = async (projectId: string) => {
    const firm = firmOf(await me(), (await need(projectQueryOptions(projectId))).organisationId);
    return firm ? warm(firmMaterialsQueryOptions(firm.id), bridgeValuesQueryOptions(firm.id)) : null;
  };

  return {
    /** Everything under it needs a signed-in person: else to sign-in, coming back here after. */
    session: (async ({ request }) => {
      if (!(await me())) {
        const url = new URL(request.url);
        throw redirect(signInPath(url.pathname + url.search));
      }
      return null;
    }) satisfies Loader,
    /** Pages that read who is signed in (sign-in and sign-up send a signed-in person on). */
    me: (() => warm(meQueryOptions())) satisfies Loader,
    invite: (({ params }) =>
      warm(meQueryOptions(), invitationQueryOptions(params.token ?? ''))) satisfies Loader,
    verify: (({ params }) => {
      const code = params.code ?? '';
      return warm(verificationQueryOptions(normaliseVerificationCode(code) ?? code));
    }) satisfies Loader,
    ...signedIn({
      adminMail: (async () => {
        await siteAdmin();
        return warm(mailQueryOptions());
      }) satisfies Loader,
      adminOrganisations: (async () => {
        await siteAdmin();
        return warm(organisationsQueryOptions());
      }) satisfies Loader,
      projects: (({ request }) =>
        warm(
          projectsQueryOptions({ archived: search(request).get('archived') === 'true' }),
        )) satisfies Loader,

      /** The frame of a project: the project itself. */
      project: (async ({ params }) => {
        await need(projectQueryOptions(idOf(params.projectId, 'project')));
        return null;
      }) satisfies Loader,
      assemblies: (({ params }) =>
        warm(
          assembliesQueryOptions(params.projectId ?? ''),
          projectsQueryOptions({ archived: false }),
        )) satisfies Loader,
      newAssembly: (({ params }) => builderLibrary(params.projectId ?? '')) satisfies Loader,
      compare: (({ params }) => warm(assembliesQueryOptions(params.projectId ?? ''))) satisfies Loader,
      submittals: (({ params, request }) =>
        warm(
          submittalsQueryOptions(params.projectId ?? '', submittalStatusOf(search(request))),
        )) satisfies Loader,
      newSubmittal: (({ params }) => warm(membersQueryOptions(params.projectId ?? ''))) satisfies Loader,
      submittal: (({ params }) =>
        warm(
          submittalQueryOptions(idOf(params.submittalId, 'submittal')),
          membersQueryOptions(params.projectId ?? ''),
        )) satisfies Loader,
      checkRunSheet: (({ params }) =>
        warm(checkRunQueryOptions(idOf(params.runId, 'check run')))) satisfies Loader,
      members: (({ params }) => warm(membersQueryOptions(params.projectId ?? ''))) satisfies Loader,
      inspections: (({ params }) => warm(inspectionsQueryOptions(params.projectId ?? ''))) satisfies Loader,
      newInspection: (({ params }) => warm(assembliesQueryOptions(params.projectId ?? ''))) satisfies Loader,
      /** An inspection, its deficiency and closing pages: the inspection (kept on the device, D-026). */
      inspection: (async ({ params }) => {
        await need(inspectionQueryOptions(idOf(params.inspectionId, 'inspection')));
        return null;
      }) satisfies Loader,
      activity: (({ params }) => warm(auditQueryOptions(params.projectId ?? ''))) satisfies Loader,

      /** The frame of an assembly: it and its project; an assembly of another project is not found here. */
      assembly: (async ({ params }) => {
        const [project, assembly] = await Promise.all([
          need(projectQueryOptions(idOf(params.projectId, 'project'))),
          need(assemblyQueryOptions(idOf(params.assemblyId, 'assembly'))),
        ]);
        if (assembly.projectId !== project.id)
          throw data('No such assembly in this project.', { status: 404 });
        return null;
      }) satisfies Loader,
      builder: (async ({ params }) => {
        await Promise.all([
          builderLibrary(params.projectId ?? ''),
          warm(revisionsQueryOptions(params.assemblyId ?? ''), projectsQueryOptions({ archived: false })),
        ]);
        return null;
      }) satisfies Loader,
      attachment: (async ({ params }) => {
        const firm = firmOf(
          await me(),
          (await need(projectQueryOptions(params.projectId ?? ''))).organisationId,
        );
        return firm ? warm(attachmentProductsQueryOptions(firm.id)) : null;
      }) satisfies Loader,
      checks: (async ({ params, request }) => {
        const projectId = params.projectId ?? '';
        const assemblyId = params.assemblyId ?? '';
        const runs = queryClient
          .ensureQueryData(checkRunsQueryOptions(projectId, assemblyId))
          .catch(() => []);
        await warm(projectCriteriaSetsQueryOptions(projectId));
        const shown = search(request).get('run') ?? (await runs)[0]?.id;
        return shown ? warm(checkRunQueryOptions(shown)) : null;
      }) satisfies Loader,
      sweep: (({ params }) => warm(projectCriteriaSetsQueryOptions(params.projectId ?? ''))) satisfies Loader,
      revision: (async ({ params }) => {
        const n = revisionOf(params.revision);
        await Promise.all([
          builderLibrary(params.projectId ?? ''),
          warm(revisionsQueryOptions(params.assemblyId ?? '')),
          n === null ? null : warm(revisionQueryOptions(params.assemblyId ?? '', n)),
        ]);
        return null;
      }) satisfies Loader,

      library: (async () => {
        const firm = firmOf(await me(), null);
        return warm(
          referenceMaterialsQueryOptions(),
          ...(firm
            ? [
                firmMaterialsQueryOptions(firm.id),
                bridgeValuesQueryOptions(firm.id),
                attachmentProductsQueryOptions(firm.id),
              ]
            : []),
        );
      }) satisfies Loader,
      codeTables: (async () => {
        const firm = firmOf(await me(), null);
        return firm ? warm(criteriaSetsQueryOptions(firm.id)) : null;
      }) satisfies Loader,
      criteriaSet: (({ params }) => {
        const setId = idOf(params.setId, 'code table');
        return warm(criteriaSetQueryOptions(setId), criteriaVersionsQueryOptions(setId));
      }) satisfies Loader,
      criteriaDiff: (({ params, request }) => {
        const setId = idOf(params.setId, 'code table');
        const versions = diffVersionsOf(search(request));
        return warm(
          criteriaSetQueryOptions(setId),
          ...(versions ? [criteriaDiffQueryOptions(setId, versions.from, versions.to)] : []),
        );
      }) satisfies Loader,
      firmMembers: (async ({ request }) => {
        const firm = firmOf(await me(), search(request).get('org'));
        return firm ? warm(firmMembersQueryOptions(firm.id)) : null;
      }) satisfies Loader,
    }),
  };
}

export type Loaders = ReturnType<typeof createLoaders>;
