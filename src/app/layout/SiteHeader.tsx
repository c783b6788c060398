import { Link, NavLink, useLocation } from 'react-router';
import { Button } from '../../components/ui/Button';
import { useSignOut } from '../../features/auth/api/sign-out';
import { useMe } from '../../features/me/api/get-me';
import { UnitToggle } from '../../features/me/components/UnitToggle';

const navClass = ({ isActive }: { isActive: boolean }) =>
  `px-1 py-1 text-sm font-medium no-underline border-b-2 ${isActive ? 'border-ink text-ink' : 'border-transparent text-ink-muted hover:text-ink hover:border-rule-strong'}`;

/** The main menu, in order; the site administrators' pages only for them. */
const MENU: { to: string; label: string; admin?: true }[] = [
  { to: '/projects', label: 'Projects' },
  { to: '/library', label: 'Library' },
  { to: '/code-tables', label: 'Code tables' },
  { to: '/admin/organisations', label: 'Firms', admin: true },
  { to: '/admin/mail', label: 'Outbox', admin: true },
  { to: '/settings', label: 'Settings' },
];

export function SiteHeader() {
  const me = useMe();
  const signOut = useSignOut();
  const location = useLocation();
  const user = me.data;

  return (
    <header className="border-b border-ink bg-paper print:hidden">
      <div className="mx-auto flex w-full max-w-sheet flex-wrap items-center gap-x-8 gap-y-3 px-4 py-3 sm:px-6">
        <Link to={user ? '/projects' : '/sign-in'} className="flex items-baseline gap-2 no-underline">
          <span className="font-serif text-2xl font-semibold tracking-tight">Skinwright</span>
          <span className="hidden text-xs text-ink-muted md:inline">metal-panel walls, proved</span>
        </Link>

        {user ? (
          <nav aria-label="Main" className="flex flex-wrap items-center gap-x-5 gap-y-1">
            {MENU.filter((m) => !m.admin || user.siteRole === 'admin').map((m) => (
              <NavLink key={m.to} to={m.to} className={navClass}>
                {m.label}
              </NavLink>
            ))}
          </nav>
        ) : null}

        <div className="ml-auto flex flex-wrap items-center gap-x-5 gap-y-2">
          {user ? (
            <>
              <UnitToggle />
              <span className="text-sm">
                <span className="sr-only">Signed in as </span>
                <span className="font-semibold">{user.name}</span>
              </span>
              <Button
                variant="quiet"
                className="px-2 py-1"
                busy={signOut.isPending}
                busyLabel="Signing out…"
                onClick={() => signOut.mutate({})}
              >
                Sign out
              </Button>
            </>
          ) : me.isSuccess && !location.pathname.startsWith('/sign-in') ? (
            <Link to="/sign-in" className="text-sm font-medium">
              Sign in
            </Link>
          ) : null}
        </div>
      </div>
    </header>
  );
}
