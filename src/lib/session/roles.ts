import type { Role } from '@/domain/contracts';

export const ROLE_LABELS: Record<Role, string> = {
  owner: 'Owner',
  designer: 'Designer',
  builder: 'Builder',
  customer: 'Customer',
  instructor: 'Instructor',
};

/** Where each role lands after signing in (and at "/"). */
export function homePathFor(role: Role): string {
  switch (role) {
    case 'owner':
    case 'designer':
      return '/designs';
    case 'builder':
      return '/workbench';
    case 'customer':
      return '/reviews';
    case 'instructor':
      return '/classes';
  }
}

/** Only same-site paths may be followed after sign-in (no "//evil.example" or absolute URLs). */
export function safeNextPath(next: string | null): string | null {
  if (!next || !next.startsWith('/') || next.startsWith('//') || next.startsWith('/\\')) return null;
  if (next.startsWith('/sign-in')) return null;
  return next;
}
