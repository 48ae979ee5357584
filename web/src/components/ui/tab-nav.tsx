import { NavLink } from 'react-router-dom';
import { cn } from '@/lib/cn';

export interface TabLink {
  to: string;
  label: string;
  /** Active only on exactly this path (not on pages below it). */
  end: boolean;
}

/** A row of links between the pages of one section; the current one is underlined. */
export function TabNav({ label, links, className }: { label: string; links: TabLink[]; className?: string }) {
  return (
    <nav aria-label={label} className={className}>
      <ul className="flex flex-wrap gap-x-1">
        {links.map((link) => (
          <li key={link.to}>
            <NavLink
              to={link.to}
              end={link.end}
              className={({ isActive }) =>
                cn(
                  'inline-flex min-h-11 items-center border-b-4 px-3 font-bold whitespace-nowrap no-underline',
                  isActive ? 'border-copper text-ink' : 'border-transparent text-ink-muted hover:text-ink',
                )
              }
            >
              {link.label}
            </NavLink>
          </li>
        ))}
      </ul>
    </nav>
  );
}
