import { Outlet, ScrollRestoration, useNavigation } from 'react-router';
import { useMe } from '../../features/me/api/get-me';
import { UnitSystemProvider } from '../../lib/unit-system';
import { SiteFooter } from './SiteFooter';
import { SiteHeader } from './SiteHeader';

export function AppShell() {
  const me = useMe();
  // A page's code and data load before it shows (lazy routes, loaders): say so at the top meanwhile.
  const loading = useNavigation().state === 'loading';
  return (
    <UnitSystemProvider value={me.data?.unitSystem ?? 'SI'}>
      <a href="#main" className="sr-only-focusable bg-ink px-3 py-2 text-paper">
        Skip to content
      </a>
      <div className="flex min-h-screen flex-col">
        <div
          role="status"
          aria-live="polite"
          className={`fixed inset-x-0 top-0 z-50 h-1 bg-copper transition-opacity print:hidden ${loading ? 'opacity-100' : 'opacity-0'}`}
        >
          <span className="sr-only">{loading ? 'Loading the page…' : ''}</span>
        </div>
        <SiteHeader />
        <main
          id="main"
          tabIndex={-1}
          className="mx-auto w-full max-w-sheet flex-1 px-4 py-8 focus:outline-none sm:px-6"
        >
          <Outlet />
        </main>
        <SiteFooter />
      </div>
      <ScrollRestoration />
    </UnitSystemProvider>
  );
}
