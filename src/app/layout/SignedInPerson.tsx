import { LogOut } from 'lucide-react';
import type { User } from '@/domain/contracts';
import { useSignOut } from '@/features/auth/api/signOut';
import { ROLE_LABELS } from '@/lib/session/roles';
import { cn } from '@/lib/cn';

function initialsOf(displayName: string): string {
  const words = displayName.trim().split(/\s+/).filter(Boolean);
  return (words[0]?.[0] ?? '?').concat(words.length > 1 ? words[words.length - 1][0] : '').toUpperCase();
}

/** Who is signed in (name and role) and the sign-out button. */
export function SignedInPerson({ user, compact }: { user: User; compact: boolean }) {
  const signOut = useSignOut();
  return (
    <div className={cn('flex items-center gap-3', compact ? 'md:flex-col md:gap-1' : 'md:border-t md:border-paper-line md:pt-4')}>
      <div className={cn('flex min-w-0 items-center gap-3', compact && 'md:flex-col md:gap-0')} title={`${user.displayName} · ${ROLE_LABELS[user.role]}`}>
        <span aria-hidden className="grid size-9 shrink-0 place-items-center rounded-full bg-ink text-xs font-semibold text-paper">
          {initialsOf(user.displayName)}
        </span>
        <div className={cn('min-w-0 flex-col', compact ? 'sr-only' : 'hidden md:flex')}>
          <span className="truncate text-sm font-semibold text-ink" data-testid="signed-in-name">
            {user.displayName}
          </span>
          <span className="text-xs uppercase tracking-wide text-ink-muted">{ROLE_LABELS[user.role]}</span>
        </div>
      </div>
      <button
        type="button"
        onClick={() => signOut.mutate()}
        disabled={signOut.isPending}
        aria-label="Sign out"
        title={signOut.error ? `Sign-out failed: ${signOut.error.message}` : 'Sign out'}
        className={cn(
          'ml-auto grid size-11 shrink-0 place-items-center rounded-lg text-ink-soft hover:bg-paper-sunk hover:text-ink focus-ring',
          compact && 'md:ml-0',
          signOut.error && 'text-severity-error',
        )}
      >
        <LogOut aria-hidden className="size-5" />
      </button>
    </div>
  );
}
