import { controlClasses } from '@/components/ui';
import type { Role, User } from '@/domain/contracts';
import { cn } from '@/lib/cn';
import { messageOf } from '@/lib/formErrors';
import { useUpdateUser } from '../api/updateUser';
import { ROLE_OPTIONS } from './roleOptions';

/** Role select for one person; saved on change, refusal shown beside it. Owners cannot change their own role. */
export function RoleCell({ user, isSelf }: { user: User; isSelf: boolean }) {
  const updateUser = useUpdateUser();
  const errorId = `role-error-${user.id}`;
  return (
    <div className="flex flex-col gap-1">
      <select
        aria-label={`Role of ${user.displayName}`}
        value={user.role}
        disabled={isSelf || updateUser.isPending}
        title={isSelf ? 'You cannot change your own role' : undefined}
        aria-invalid={updateUser.error ? true : undefined}
        aria-describedby={updateUser.error ? errorId : undefined}
        onChange={(event) => updateUser.mutate({ id: user.id, role: event.target.value as Role })}
        className={cn(controlClasses, 'w-40 disabled:bg-paper-sunk disabled:text-ink-muted')}
      >
        {ROLE_OPTIONS.map((option) => (
          <option key={option.value} value={option.value}>
            {option.label}
          </option>
        ))}
      </select>
      {updateUser.error ? (
        <p id={errorId} role="alert" className="max-w-56 text-xs text-severity-error">
          Error: {messageOf(updateUser.error)}
        </p>
      ) : null}
    </div>
  );
}
