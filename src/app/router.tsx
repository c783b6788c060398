import { uuidParam } from '@shared/schemas/common';
import type { QueryClient } from '@tanstack/react-query';
import type { ComponentType } from 'react';
import { createBrowserRouter, data, type LoaderFunctionArgs, redirect } from 'react-router';
import { assemblyQueryOptions } from '../features/assemblies/api/get-assembly';
import { meQueryOptions } from '../features/me/api/get-me';
import { projectQueryOptions } from '../features/projects/api/get-project';
import { signInPath } from '../lib/safe-next';
import { AppShell } from './layout/AppShell';
import { AssemblyLayout } from './layout/AssemblyLayout';
import { ProjectLayout } from './layout/ProjectLayout';
import { RequireSession } from './layout/RequireSession';
import { NotFoundPage } from './routes/NotFoundPage';
import { RouteError } from './routes/RouteError';

/**
 * A route whose page is a chunk of its own, loaded on the first visit: the first page a person opens
 * downloads only what it draws (the charts, for one, come only with the pages that draw them).
 */
const page = (load: () => Promise<ComponentType>) => ({
  lazy: async () => ({ Component: await load() }),
});

/**
 * Routes. Loaders use the same query options as the components (ensureQueryData), so a page renders
 * from the cache the loader filled. Everything below `RequireSession` needs a signed-in person.
 */
export function createAppRouter(queryClient: QueryClient) {
  const requireSession = async ({ request }: LoaderFunctionArgs) => {
    const me = await queryClient.ensureQueryData(meQueryOptions());
    if (!me) {
      const url = new URL(request.url);
      throw redirect(signInPath(url.pathname + url.search));
    }
    return null;
  };

  const requireSiteAdmin = async () => {
    const me = await queryClient.ensureQueryData(meQueryOptions());
    if (me?.siteRole !== 'admin') throw data('This page is for site administrators.', { status: 403 });
    return null;
  };

  const loadProject = async ({ params }: LoaderFunctionArgs) => {
    if (!uuidParam.safeParse({ id: params.id }).success) throw data('No such project.', { status: 404 });
    await queryClient.ensureQueryData(projectQueryOptions(params.id as string));
    return null;
  };

  const checkSetId = ({ params }: LoaderFunctionArgs) => {
    if (!uuidParam.safeParse({ id: params.setId }).success)
      throw data('No such code table.', { status: 404 });
    return null;
  };

  /** An assembly of this project (the same query options as its pages); one of another project is not found. */
  const loadAssembly = async ({ params }: LoaderFunctionArgs) => {
    if (!uuidParam.safeParse({ id: params.id }).success) throw data('No such project.', { status: 404 });
    if (!uuidParam.safeParse({ id: params.assemblyId }).success)
      throw data('No such assembly.', { status: 404 });
    const [project, assembly] = await Promise.all([
      queryClient.ensureQueryData(projectQueryOptions(params.id as string)),
      queryClient.ensureQueryData(assemblyQueryOptions(params.assemblyId as string)),
    ]);
    if (assembly.projectId !== project.id) throw data('No such assembly in this project.', { status: 404 });
    return null;
  };

  const checkSubmittalId = ({ params }: LoaderFunctionArgs) => {
    if (!uuidParam.safeParse({ id: params.submittalId }).success)
      throw data('No such submittal.', { status: 404 });
    return null;
  };

  const checkRunId = ({ params }: LoaderFunctionArgs) => {
    if (!uuidParam.safeParse({ id: params.runId }).success) throw data('No such check run.', { status: 404 });
    return null;
  };

  return createBrowserRouter([
    {
      element: <AppShell />,
      // Shown while the first loaders (the session check) run.
      hydrateFallbackElement: <p className="p-8 font-serif text-2xl">Skinwright</p>,
      children: [
        {
          errorElement: <RouteError />,
          children: [
            { path: '/sign-in', ...page(() => import('./routes/SignInPage').then((m) => m.SignInPage)) },
            { path: '/sign-up', ...page(() => import('./routes/SignUpPage').then((m) => m.SignUpPage)) },
            {
              path: '/forgot-password',
              ...page(() => import('./routes/ForgotPasswordPage').then((m) => m.ForgotPasswordPage)),
            },
            {
              path: '/reset-password',
              ...page(() => import('./routes/ResetPasswordPage').then((m) => m.ResetPasswordPage)),
            },
            {
              path: '/invite/:token',
              ...page(() => import('./routes/InvitePage').then((m) => m.InvitePage)),
            },
            // Public: anyone holding a compliance sheet confirms it here without signing in.
            { path: '/verify/:code', ...page(() => import('./routes/VerifyPage').then((m) => m.VerifyPage)) },
            {
              loader: requireSession,
              element: <RequireSession />,
              children: [
                { path: '/', loader: () => redirect('/projects') },
                {
                  path: '/projects',
                  ...page(() => import('./routes/ProjectsPage').then((m) => m.ProjectsPage)),
                },
                {
                  path: '/projects/new',
                  ...page(() => import('./routes/NewProjectPage').then((m) => m.NewProjectPage)),
                },
                {
                  path: '/projects/:id',
                  loader: loadProject,
                  element: <ProjectLayout />,
                  children: [
                    {
                      index: true,
                      ...page(() =>
                        import('./routes/ProjectOverviewPage').then((m) => m.ProjectOverviewPage),
                      ),
                    },
                    {
                      path: 'assemblies',
                      ...page(() =>
                        import('./routes/ProjectAssembliesPage').then((m) => m.ProjectAssembliesPage),
                      ),
                    },
                    {
                      path: 'assemblies/new',
                      ...page(() => import('./routes/NewAssemblyPage').then((m) => m.NewAssemblyPage)),
                    },
                    {
                      path: 'assemblies/compare',
                      ...page(() =>
                        import('./routes/CompareAssembliesPage').then((m) => m.CompareAssembliesPage),
                      ),
                    },
                    {
                      // The frame of one assembly: its loader loads it and refuses one of another project.
                      path: 'assemblies/:assemblyId',
                      loader: loadAssembly,
                      element: <AssemblyLayout />,
                      children: [
                        {
                          index: true,
                          ...page(() =>
                            import('./routes/AssemblyBuilderPage').then((m) => m.AssemblyBuilderPage),
                          ),
                        },
                        {
                          path: 'attachment',
                          ...page(() =>
                            import('./routes/AssemblyAttachmentPage').then((m) => m.AssemblyAttachmentPage),
                          ),
                        },
                        {
                          path: 'moisture',
                          ...page(() =>
                            import('./routes/AssemblyMoisturePage').then((m) => m.AssemblyMoisturePage),
                          ),
                        },
                        {
                          path: 'joints',
                          ...page(() =>
                            import('./routes/AssemblyJointsPage').then((m) => m.AssemblyJointsPage),
                          ),
                        },
                        {
                          path: 'checks',
                          ...page(() =>
                            import('./routes/AssemblyChecksPage').then((m) => m.AssemblyChecksPage),
                          ),
                        },
                        {
                          path: 'revisions/:revision',
                          ...page(() =>
                            import('./routes/AssemblyRevisionPage').then((m) => m.AssemblyRevisionPage),
                          ),
                        },
                      ],
                    },
                    {
                      path: 'check-runs/:runId/sheet',
                      loader: checkRunId,
                      ...page(() => import('./routes/CheckRunSheetPage').then((m) => m.CheckRunSheetPage)),
                    },
                    {
                      path: 'submittals',
                      ...page(() =>
                        import('./routes/ProjectSubmittalsPage').then((m) => m.ProjectSubmittalsPage),
                      ),
                    },
                    {
                      path: 'submittals/new',
                      ...page(() => import('./routes/NewSubmittalPage').then((m) => m.NewSubmittalPage)),
                    },
                    {
                      path: 'submittals/:submittalId',
                      loader: checkSubmittalId,
                      ...page(() => import('./routes/SubmittalPage').then((m) => m.SubmittalPage)),
                    },
                    {
                      path: 'climate',
                      ...page(() => import('./routes/ProjectClimatePage').then((m) => m.ProjectClimatePage)),
                    },
                    {
                      path: 'wind',
                      ...page(() => import('./routes/ProjectWindPage').then((m) => m.ProjectWindPage)),
                    },
                    {
                      path: 'members',
                      ...page(() => import('./routes/ProjectMembersPage').then((m) => m.ProjectMembersPage)),
                    },
                    {
                      path: 'activity',
                      ...page(() =>
                        import('./routes/ProjectActivityPage').then((m) => m.ProjectActivityPage),
                      ),
                    },
                  ],
                },
                {
                  path: '/library',
                  ...page(() => import('./routes/LibraryPage').then((m) => m.LibraryPage)),
                },
                {
                  path: '/code-tables',
                  ...page(() => import('./routes/CodeTablesPage').then((m) => m.CodeTablesPage)),
                },
                {
                  path: '/code-tables/:setId',
                  loader: checkSetId,
                  ...page(() => import('./routes/CriteriaSetPage').then((m) => m.CriteriaSetPage)),
                },
                {
                  path: '/code-tables/:setId/diff',
                  loader: checkSetId,
                  ...page(() => import('./routes/CriteriaDiffPage').then((m) => m.CriteriaDiffPage)),
                },
                {
                  path: '/settings',
                  ...page(() => import('./routes/SettingsPage').then((m) => m.SettingsPage)),
                },
                {
                  path: '/settings/firm',
                  ...page(() => import('./routes/FirmMembersPage').then((m) => m.FirmMembersPage)),
                },
                {
                  path: '/admin/mail',
                  loader: requireSiteAdmin,
                  ...page(() => import('./routes/AdminMailPage').then((m) => m.AdminMailPage)),
                },
                {
                  path: '/admin/organisations',
                  loader: requireSiteAdmin,
                  ...page(() =>
                    import('./routes/AdminOrganisationsPage').then((m) => m.AdminOrganisationsPage),
                  ),
                },
              ],
            },
            { path: '*', element: <NotFoundPage /> },
          ],
        },
      ],
    },
  ]);
}
