import { Outlet, ScrollRestoration } from 'react-router';
import { useMe } from '../../features/me/api/get-me';
import { UnitSystemProvider } from '../../lib/unit-system';
import { SiteFooter } from './SiteFooter';
import { SiteHeader } from './SiteHeader';

export function AppShell() {
  const me = useMe();
  return (
    <UnitSystemProvider value={me.data?.unitSystem ?? 'SI'}>
      <a href="#main" className="sr-only-focusable bg-ink px-3 py-2 text-paper">
        Skip to content
      </a>
      <div className="flex min-h-screen flex-col">
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
