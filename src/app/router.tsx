import { uuidParam } from '@shared/schemas/common';
import type { QueryClient } from '@tanstack/react-query';
import { createBrowserRouter, data, type LoaderFunctionArgs, redirect } from 'react-router';
import { meQueryOptions } from '../features/me/api/get-me';
import { projectQueryOptions } from '../features/projects/api/get-project';
import { signInPath } from '../lib/safe-next';
import { AppShell } from './layout/AppShell';
import { ProjectLayout } from './layout/ProjectLayout';
import { RequireSession } from './layout/RequireSession';
import { AdminMailPage } from './routes/AdminMailPage';
import { AssemblyAttachmentPage } from './routes/AssemblyAttachmentPage';
import { AssemblyBuilderPage } from './routes/AssemblyBuilderPage';
import { AssemblyChecksPage } from './routes/AssemblyChecksPage';
import { AssemblyJointsPage } from './routes/AssemblyJointsPage';
import { AssemblyMoisturePage } from './routes/AssemblyMoisturePage';
import { AssemblyRevisionPage } from './routes/AssemblyRevisionPage';
import { CheckRunSheetPage } from './routes/CheckRunSheetPage';
import { CodeTablesPage } from './routes/CodeTablesPage';
import { CompareAssembliesPage } from './routes/CompareAssembliesPage';
import { CriteriaDiffPage } from './routes/CriteriaDiffPage';
import { CriteriaSetPage } from './routes/CriteriaSetPage';
import { ForgotPasswordPage } from './routes/ForgotPasswordPage';
import { InvitePage } from './routes/InvitePage';
import { LibraryPage } from './routes/LibraryPage';
import { NewAssemblyPage } from './routes/NewAssemblyPage';
import { NewProjectPage } from './routes/NewProjectPage';
import { NewSubmittalPage } from './routes/NewSubmittalPage';
import { NotFoundPage } from './routes/NotFoundPage';
import { ProjectActivityPage } from './routes/ProjectActivityPage';
import { ProjectAssembliesPage } from './routes/ProjectAssembliesPage';
import { ProjectClimatePage } from './routes/ProjectClimatePage';
import { ProjectMembersPage } from './routes/ProjectMembersPage';
import { ProjectOverviewPage } from './routes/ProjectOverviewPage';
import { ProjectSubmittalsPage } from './routes/ProjectSubmittalsPage';
import { ProjectsPage } from './routes/ProjectsPage';
import { ProjectWindPage } from './routes/ProjectWindPage';
import { ResetPasswordPage } from './routes/ResetPasswordPage';
import { RouteError } from './routes/RouteError';
import { SettingsPage } from './routes/SettingsPage';
import { SignInPage } from './routes/SignInPage';
import { SignUpPage } from './routes/SignUpPage';
import { SubmittalPage } from './routes/SubmittalPage';
import { VerifyPage } from './routes/VerifyPage';

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

  const checkAssemblyId = ({ params }: LoaderFunctionArgs) => {
    if (!uuidParam.safeParse({ id: params.assemblyId }).success)
      throw data('No such assembly.', { status: 404 });
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
            { path: '/sign-in', element: <SignInPage /> },
            { path: '/sign-up', element: <SignUpPage /> },
            { path: '/forgot-password', element: <ForgotPasswordPage /> },
            { path: '/reset-password', element: <ResetPasswordPage /> },
            { path: '/invite/:token', element: <InvitePage /> },
            // Public: anyone holding a compliance sheet confirms it here without signing in.
            { path: '/verify/:code', element: <VerifyPage /> },
            {
              loader: requireSession,
              element: <RequireSession />,
              children: [
                { path: '/', loader: () => redirect('/projects') },
                { path: '/projects', element: <ProjectsPage /> },
                { path: '/projects/new', element: <NewProjectPage /> },
                {
                  path: '/projects/:id',
                  loader: loadProject,
                  element: <ProjectLayout />,
                  children: [
                    { index: true, element: <ProjectOverviewPage /> },
                    { path: 'assemblies', element: <ProjectAssembliesPage /> },
                    { path: 'assemblies/new', element: <NewAssemblyPage /> },
                    { path: 'assemblies/compare', element: <CompareAssembliesPage /> },
                    {
                      path: 'assemblies/:assemblyId',
                      loader: checkAssemblyId,
                      element: <AssemblyBuilderPage />,
                    },
                    {
                      path: 'assemblies/:assemblyId/attachment',
                      loader: checkAssemblyId,
                      element: <AssemblyAttachmentPage />,
                    },
                    {
                      path: 'assemblies/:assemblyId/moisture',
                      loader: checkAssemblyId,
                      element: <AssemblyMoisturePage />,
                    },
                    {
                      path: 'assemblies/:assemblyId/joints',
                      loader: checkAssemblyId,
                      element: <AssemblyJointsPage />,
                    },
                    {
                      path: 'assemblies/:assemblyId/checks',
                      loader: checkAssemblyId,
                      element: <AssemblyChecksPage />,
                    },
                    {
                      path: 'assemblies/:assemblyId/revisions/:revision',
                      loader: checkAssemblyId,
                      element: <AssemblyRevisionPage />,
                    },
                    {
                      path: 'check-runs/:runId/sheet',
                      loader: checkRunId,
                      element: <CheckRunSheetPage />,
                    },
                    { path: 'submittals', element: <ProjectSubmittalsPage /> },
                    { path: 'submittals/new', element: <NewSubmittalPage /> },
                    {
                      path: 'submittals/:submittalId',
                      loader: checkSubmittalId,
                      element: <SubmittalPage />,
                    },
                    { path: 'climate', element: <ProjectClimatePage /> },
                    { path: 'wind', element: <ProjectWindPage /> },
                    { path: 'members', element: <ProjectMembersPage /> },
                    { path: 'activity', element: <ProjectActivityPage /> },
                  ],
                },
                { path: '/library', element: <LibraryPage /> },
                { path: '/code-tables', element: <CodeTablesPage /> },
                { path: '/code-tables/:setId', loader: checkSetId, element: <CriteriaSetPage /> },
                { path: '/code-tables/:setId/diff', loader: checkSetId, element: <CriteriaDiffPage /> },
                { path: '/settings', element: <SettingsPage /> },
                { path: '/admin/mail', loader: requireSiteAdmin, element: <AdminMailPage /> },
              ],
            },
            { path: '*', element: <NotFoundPage /> },
          ],
        },
      ],
    },
  ]);
}
