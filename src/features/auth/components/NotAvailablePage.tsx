import { Link } from 'react-router';
import { ShieldBan } from 'lucide-react';
import { EmptyState } from '@/components/ui';
import type { Role } from '@/domain/contracts';
import { ROLE_LABELS, homePathFor } from '@/lib/session/roles';

/** Shown when a signed-in person opens a page their role does not include. */
export function NotAvailablePage({ role }: { role: Role }) {
  return (
    <div className="p-6 md:p-10">
      <h1 className="sr-only">Not available for your role</h1>
      <EmptyState
        icon={<ShieldBan className="size-7" />}
        title="This page is not available for your role"
        action={
          <Link
            to={homePathFor(role)}
            className="inline-flex min-h-11 items-center rounded-lg bg-accent px-4 text-sm font-medium text-accent-ink hover:bg-accent-strong focus-ring"
          >
            Go to your start page
          </Link>
        }
      >
        You are signed in as <strong>{ROLE_LABELS[role].toLowerCase()}</strong>. If you need this page, ask the shop owner to
        change your role.
      </EmptyState>
    </div>
  );
}
