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
 * The pages, each a chunk of its own loaded on the first visit: the first page a person opens downloads only
 * what it draws (the charts, for one, come only with the pages that draw them). `routes/<Name>.tsx` exports
 * the component `<Name>`; the not-found page is drawn at once, so it is no chunk.
 */
const PAGES = import.meta.glob<Record<string, ComponentType>>([
  './routes/*Page.tsx',
  '!./routes/NotFoundPage.tsx',
]);

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
  /** A route's page (`routes/<name>.tsx`), loaded lazily, and the loader that fills its cache meanwhile. */
  const page = (name: string, loader?: keyof Loaders) => {
    const chunk = PAGES[`./routes/${name}.tsx`];
    if (!chunk) throw new Error(`No page src/app/routes/${name}.tsx`);
    return {
      ...(loader && { loader: load(loader) }),
      lazy: async () => ({ Component: (await chunk())[name] }),
    };
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
            { path: '/sign-in', ...page('SignInPage', 'me') },
            { path: '/sign-up', ...page('SignUpPage', 'me') },
            { path: '/forgot-password', ...page('ForgotPasswordPage') },
            { path: '/reset-password', ...page('ResetPasswordPage') },
            { path: '/invite/:token', ...page('InvitePage', 'invite') },
            // Public: anyone holding a compliance sheet confirms it here without signing in.
            { path: '/verify/:code', ...page('VerifyPage', 'verify') },
            {
              loader: load('session'),
              element: <RequireSession />,
              children: [
                { path: '/', loader: () => redirect('/projects') },
                { path: '/projects', ...page('ProjectsPage', 'projects') },
                { path: '/projects/new', ...page('NewProjectPage') },
                {
                  path: '/projects/:projectId',
                  loader: load('project'),
                  element: <ProjectLayout />,
                  children: [
                    { index: true, ...page('ProjectOverviewPage') },
                    { path: 'assemblies', ...page('ProjectAssembliesPage', 'assemblies') },
                    { path: 'assemblies/new', ...page('NewAssemblyPage', 'newAssembly') },
                    { path: 'assemblies/compare', ...page('CompareAssembliesPage', 'compare') },
                    {
                      // The frame of one assembly: its loader loads it and refuses one of another project.
                      path: 'assemblies/:assemblyId',
                      loader: load('assembly'),
                      element: <AssemblyLayout />,
                      children: [
                        { index: true, ...page('AssemblyBuilderPage', 'builder') },
                        { path: 'attachment', ...page('AssemblyAttachmentPage', 'attachment') },
                        { path: 'moisture', ...page('AssemblyMoisturePage') },
                        { path: 'joints', ...page('AssemblyJointsPage') },
                        { path: 'checks', ...page('AssemblyChecksPage', 'checks') },
                        { path: 'sweep', ...page('AssemblySweepPage', 'sweep') },
                        { path: 'revisions/:revision', ...page('AssemblyRevisionPage', 'revision') },
                      ],
                    },
                    { path: 'check-runs/:runId/sheet', ...page('CheckRunSheetPage', 'checkRunSheet') },
                    { path: 'submittals', ...page('ProjectSubmittalsPage', 'submittals') },
                    { path: 'submittals/new', ...page('NewSubmittalPage', 'newSubmittal') },
                    { path: 'submittals/:submittalId', ...page('SubmittalPage', 'submittal') },
                    { path: 'inspections', ...page('ProjectInspectionsPage', 'inspections') },
                    { path: 'inspections/new', ...page('NewInspectionPage', 'newInspection') },
                    { path: 'inspections/:inspectionId', ...page('InspectionPage', 'inspection') },
                    { path: 'inspections/:inspectionId/close', ...page('CloseInspectionPage', 'inspection') },
                    {
                      path: 'inspections/:inspectionId/deficiencies/:deficiencyId',
                      ...page('DeficiencyPage', 'inspection'),
                    },
                    { path: 'climate', ...page('ProjectClimatePage') },
                    { path: 'wind', ...page('ProjectWindPage') },
                    { path: 'members', ...page('ProjectMembersPage', 'members') },
                    { path: 'activity', ...page('ProjectActivityPage', 'activity') },
                  ],
                },
                { path: '/library', ...page('LibraryPage', 'library') },
                { path: '/code-tables', ...page('CodeTablesPage', 'codeTables') },
                { path: '/code-tables/:setId', ...page('CriteriaSetPage', 'criteriaSet') },
                { path: '/code-tables/:setId/diff', ...page('CriteriaDiffPage', 'criteriaDiff') },
                { path: '/settings', ...page('SettingsPage') },
                { path: '/settings/firm', ...page('FirmMembersPage', 'firmMembers') },
                { path: '/admin/mail', ...page('AdminMailPage', 'adminMail') },
                { path: '/admin/organisations', ...page('AdminOrganisationsPage', 'adminOrganisations') },
              ],
            },
            { path: '*', element: <NotFoundPage /> },
          ],
        },
      ],
    },
  ]);
}
