import type { ReactNode } from 'react';
import { Link } from 'react-router';
import type { User } from '@/domain/contracts';
import { homePathFor } from '@/lib/session/roles';
import { cn } from '@/lib/cn';
import { RailNav } from './RailNav';
import { SignedInPerson } from './SignedInPerson';
import { SkipLink } from './SkipLink';
import { SlotwiseMark } from '@/components/ui/SlotwiseMark';

export interface AppShellProps {
  user: User;
  /** Narrow icon rail and a full-bleed main area, for the editor where the model is the hero. */
  compact?: boolean;
  children: ReactNode;
}

/** The signed-in frame: a left rail (a top bar on phones) with the mark, the role's navigation and the person. */
export function AppShell({ user, compact = false, children }: AppShellProps) {
  return (
    <div className={cn('flex min-h-dvh flex-col md:flex-row', compact && 'md:h-dvh md:overflow-hidden')}>
      <SkipLink />
      <header
        className={cn(
          'sticky top-0 z-30 flex shrink-0 items-center gap-2 border-b border-paper-line bg-paper-raised px-3 py-2',
          'md:h-dvh md:flex-col md:items-stretch md:border-b-0 md:border-r md:py-4',
          compact ? 'md:w-[76px] md:items-center md:px-2' : 'md:w-60 md:gap-6 md:px-4',
        )}
      >
        <Link
          to={homePathFor(user.role)}
          className={cn('flex min-h-11 items-center gap-2.5 rounded-lg px-1 focus-ring', compact ? 'md:justify-center' : '')}
          aria-label="Slotwise home"
        >
          <SlotwiseMark className="size-9 shrink-0" />
          <span className={cn('text-lg font-semibold tracking-tight text-ink', compact ? 'hidden' : 'hidden sm:inline')}>Slotwise</span>
        </Link>
        <div className="min-w-0 flex-1 md:flex-none">
          <RailNav role={user.role} compact={compact} />
        </div>
        <div className={cn('md:mt-auto', compact && 'md:w-full md:flex md:justify-center')}>
          <SignedInPerson user={user} compact={compact} />
        </div>
      </header>
      <main id="main" tabIndex={-1} className={cn('min-w-0 flex-1 outline-none', compact ? 'relative md:h-dvh' : '')}>
        {children}
      </main>
    </div>
  );
}
