import { type ReactNode, useLayoutEffect, useRef } from 'react';
import { NavLink, useLocation } from 'react-router';

export interface Tab {
  to: string;
  label: ReactNode;
  /** Active only on this very address, not on the pages below it (an overview tab). */
  end?: boolean;
}

const tabClass = ({ isActive }: { isActive: boolean }) =>
  `-mb-px shrink-0 whitespace-nowrap border-b-2 px-1 pb-2 text-sm font-semibold no-underline ${isActive ? 'border-ink text-ink' : 'border-transparent text-ink-muted hover:text-ink'}`;

/**
 * A row of page tabs over a hairline. On a narrow screen the row scrolls sideways inside itself (the page
 * never does), and the tab of the page shown is scrolled into view whenever the address changes.
 */
export function TabStrip({
  label,
  tabs,
  className = '',
}: {
  label: string;
  tabs: Tab[];
  className?: string;
}) {
  const strip = useRef<HTMLElement>(null);
  const shownFor = useRef('');
  const { pathname } = useLocation();

  useLayoutEffect(() => {
    const box = strip.current;
    const active = box?.querySelector<HTMLElement>('[aria-current="page"]');
    if (!box || !active || shownFor.current === pathname) return;
    shownFor.current = pathname;
    // Only the strip scrolls (scrollIntoView would move the page as well); offsets are within the strip.
    const margin = 16;
    const start = active.offsetLeft - margin;
    const end = active.offsetLeft + active.offsetWidth + margin;
    if (start < box.scrollLeft) box.scrollLeft = start;
    else if (end > box.scrollLeft + box.clientWidth) box.scrollLeft = end - box.clientWidth;
  });

  return (
    <nav
      ref={strip}
      aria-label={label}
      className={`relative overflow-x-auto [scrollbar-width:thin] ${className}`}
    >
      <div className="flex w-max min-w-full gap-x-6 border-b border-rule">
        {tabs.map((tab) => (
          <NavLink key={tab.to} to={tab.to} end={tab.end} className={tabClass}>
            {tab.label}
          </NavLink>
        ))}
      </div>
    </nav>
  );
}
