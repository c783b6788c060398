import type { QueryClient } from '@tanstack/react-query';
import type { ComponentType } from 'react';
import { createBrowserRouter, type LoaderFunctionArgs, redirect } from 'react-router';
import { AppShell } from './layout/AppShell';
import { AssemblyLayout } from './layout/AssemblyLayout';
import { ProjectLayout } from './layout/ProjectLayout';
import { RequireSession } from './layout/RequireSession';
import type { Loaders } from './loaders';
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
 * Routes. Every page is lazy; its loader (src/app/loaders.ts) fills the cache with the same query options as
 * its components (ensureQueryData) while its chunk downloads, so it renders from the cache the loader filled;
 * meanwhile the bar at the top of AppShell says the page is loading. Everything below `RequireSession` needs a
 * signed-in person.
 */
export function createAppRouter(queryClient: QueryClient) {
  // The loaders, with the query options of every page, are a chunk of their own asked for at once (beside the
  // first page's chunk): the first page downloads no other page's data code.
  const loaders = import('./loaders').then((m) => m.createLoaders(queryClient));
  const load = (name: keyof Loaders) => async (args: LoaderFunctionArgs) => (await loaders)[name](args);

  return createBrowserRouter([
    {
      element: <AppShell />,
      // Shown while the first loaders (the session check) run.
      hydrateFallbackElement: <p className="p-8 font-serif text-2xl">Skinwright</p>,
      children: [
        {
          errorElement: <RouteError />,
          children: [
            {
              path: '/sign-in',
              loader: load('me'),
              ...page(() => import('./routes/SignInPage').then((m) => m.SignInPage)),
            },
            {
              path: '/sign-up',
              loader: load('me'),
              ...page(() => import('./routes/SignUpPage').then((m) => m.SignUpPage)),
            },
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
              loader: load('invite'),
              ...page(() => import('./routes/InvitePage').then((m) => m.InvitePage)),
            },
            // Public: anyone holding a compliance sheet confirms it here without signing in.
            {
              path: '/verify/:code',
              loader: load('verify'),
              ...page(() => import('./routes/VerifyPage').then((m) => m.VerifyPage)),
            },
            {
              loader: load('session'),
              element: <RequireSession />,
              children: [
                { path: '/', loader: () => redirect('/projects') },
                {
                  path: '/projects',
                  loader: load('projects'),
                  ...page(() => import('./routes/ProjectsPage').then((m) => m.ProjectsPage)),
                },
                {
                  path: '/projects/new',
                  ...page(() => import('./routes/NewProjectPage').then((m) => m.NewProjectPage)),
                },
                {
                  path: '/projects/:projectId',
                  loader: load('project'),
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
                      loader: load('assemblies'),
                      ...page(() =>
                        import('./routes/ProjectAssembliesPage').then((m) => m.ProjectAssembliesPage),
                      ),
                    },
                    {
                      path: 'assemblies/new',
                      loader: load('newAssembly'),
                      ...page(() => import('./routes/NewAssemblyPage').then((m) => m.NewAssemblyPage)),
                    },
                    {
                      path: 'assemblies/compare',
                      loader: load('compare'),
                      ...page(() =>
                        import('./routes/CompareAssembliesPage').then((m) => m.CompareAssembliesPage),
                      ),
                    },
                    {
                      // The frame of one assembly: its loader loads it and refuses one of another project.
                      path: 'assemblies/:assemblyId',
                      loader: load('assembly'),
                      element: <AssemblyLayout />,
                      children: [
                        {
                          index: true,
                          loader: load('builder'),
                          ...page(() =>
                            import('./routes/AssemblyBuilderPage').then((m) => m.AssemblyBuilderPage),
                          ),
                        },
                        {
                          path: 'attachment',
                          loader: load('attachment'),
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
                          loader: load('checks'),
                          ...page(() =>
                            import('./routes/AssemblyChecksPage').then((m) => m.AssemblyChecksPage),
                          ),
                        },
                        {
                          path: 'sweep',
                          loader: load('sweep'),
                          ...page(() =>
                            import('./routes/AssemblySweepPage').then((m) => m.AssemblySweepPage),
                          ),
                        },
                        {
                          path: 'revisions/:revision',
                          loader: load('revision'),
                          ...page(() =>
                            import('./routes/AssemblyRevisionPage').then((m) => m.AssemblyRevisionPage),
                          ),
                        },
                      ],
                    },
                    {
                      path: 'check-runs/:runId/sheet',
                      loader: load('checkRunSheet'),
                      ...page(() => import('./routes/CheckRunSheetPage').then((m) => m.CheckRunSheetPage)),
                    },
                    {
                      path: 'submittals',
                      loader: load('submittals'),
                      ...page(() =>
                        import('./routes/ProjectSubmittalsPage').then((m) => m.ProjectSubmittalsPage),
                      ),
                    },
                    {
                      path: 'submittals/new',
                      loader: load('newSubmittal'),
                      ...page(() => import('./routes/NewSubmittalPage').then((m) => m.NewSubmittalPage)),
                    },
                    {
                      path: 'submittals/:submittalId',
                      loader: load('submittal'),
                      ...page(() => import('./routes/SubmittalPage').then((m) => m.SubmittalPage)),
                    },
                    {
                      path: 'inspections',
                      loader: load('inspections'),
                      ...page(() =>
                        import('./routes/ProjectInspectionsPage').then((m) => m.ProjectInspectionsPage),
                      ),
                    },
                    {
                      path: 'inspections/new',
                      loader: load('newInspection'),
                      ...page(() => import('./routes/NewInspectionPage').then((m) => m.NewInspectionPage)),
                    },
                    {
                      path: 'inspections/:inspectionId',
                      loader: load('inspection'),
                      ...page(() => import('./routes/InspectionPage').then((m) => m.InspectionPage)),
                    },
                    {
                      path: 'inspections/:inspectionId/close',
                      loader: load('inspection'),
                      ...page(() =>
                        import('./routes/CloseInspectionPage').then((m) => m.CloseInspectionPage),
                      ),
                    },
                    {
                      path: 'inspections/:inspectionId/deficiencies/:deficiencyId',
                      loader: load('inspection'),
                      ...page(() => import('./routes/DeficiencyPage').then((m) => m.DeficiencyPage)),
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
                      loader: load('members'),
                      ...page(() => import('./routes/ProjectMembersPage').then((m) => m.ProjectMembersPage)),
                    },
                    {
                      path: 'activity',
                      loader: load('activity'),
                      ...page(() =>
                        import('./routes/ProjectActivityPage').then((m) => m.ProjectActivityPage),
                      ),
                    },
                  ],
                },
                {
                  path: '/library',
                  loader: load('library'),
                  ...page(() => import('./routes/LibraryPage').then((m) => m.LibraryPage)),
                },
                {
                  path: '/code-tables',
                  loader: load('codeTables'),
                  ...page(() => import('./routes/CodeTablesPage').then((m) => m.CodeTablesPage)),
                },
                {
                  path: '/code-tables/:setId',
                  loader: load('criteriaSet'),
                  ...page(() => import('./routes/CriteriaSetPage').then((m) => m.CriteriaSetPage)),
                },
                {
                  path: '/code-tables/:setId/diff',
                  loader: load('criteriaDiff'),
                  ...page(() => import('./routes/CriteriaDiffPage').then((m) => m.CriteriaDiffPage)),
                },
                {
                  path: '/settings',
                  ...page(() => import('./routes/SettingsPage').then((m) => m.SettingsPage)),
                },
                {
                  path: '/settings/firm',
                  loader: load('firmMembers'),
                  ...page(() => import('./routes/FirmMembersPage').then((m) => m.FirmMembersPage)),
                },
                {
                  path: '/admin/mail',
                  loader: load('adminMail'),
                  ...page(() => import('./routes/AdminMailPage').then((m) => m.AdminMailPage)),
                },
                {
                  path: '/admin/organisations',
                  loader: load('adminOrganisations'),
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
