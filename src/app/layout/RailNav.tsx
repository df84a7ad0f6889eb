import { NavLink } from 'react-router';
import type { Role } from '@/domain/contracts';
import { cn } from '@/lib/cn';
import { NAV_ITEMS_BY_ROLE } from './navItems';

/** The role's navigation entries; on phones and in `compact` (editor) mode a small label sits under each icon. */
export function RailNav({ role, compact }: { role: Role; compact: boolean }) {
  return (
    <nav aria-label="Main" className="min-w-0">
      <ul className={cn('flex flex-row gap-1 md:flex-col', compact && 'md:items-center')}>
        {NAV_ITEMS_BY_ROLE[role].map(({ to, label, icon: Icon }) => (
          <li key={to}>
            <NavLink
              to={to}
              className={({ isActive }) =>
                cn(
                  'flex min-h-11 min-w-11 flex-col items-center justify-center gap-0.5 rounded-lg px-1.5 py-1 text-[11px] font-medium transition-colors focus-ring',
                  // Phones always get the stacked icon-and-label form; wide screens get rows unless compact.
                  compact ? 'md:w-14' : 'md:flex-row md:justify-start md:gap-3 md:px-3 md:py-0 md:text-sm',
                  isActive ? 'bg-accent-soft text-accent-strong' : 'text-ink-soft hover:bg-paper-sunk hover:text-ink',
                )
              }
            >
              <Icon aria-hidden className="size-5 shrink-0" />
              <span>{label}</span>
            </NavLink>
          </li>
        ))}
      </ul>
    </nav>
  );
}
