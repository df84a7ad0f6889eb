import { useState, type FormEvent } from 'react';
import { Link, useSearchParams } from 'react-router';
import { Button, ErrorNotice, TextField } from '@/components/ui';
import { isApiError } from '@/lib/apiClient';
import { messageOf } from '@/lib/formErrors';
import { useConfirmPasswordReset } from '../api/confirmPasswordReset';

export default function ResetPasswordPage() {
  const [search] = useSearchParams();
  const token = search.get('token') ?? '';
  const confirm = useConfirmPasswordReset();
  const [password, setPassword] = useState('');
  const submit = (event: FormEvent) => {
    event.preventDefault();
    confirm.mutate({ token, newPassword: password });
  };
  const fieldError = isApiError(confirm.error) ? confirm.error.fields.newPassword : undefined;
  return (
    <main id="main" className="mx-auto flex min-h-dvh max-w-sm flex-col justify-center gap-6 px-6">
      <h1 className="text-2xl font-semibold text-ink">Choose a new password</h1>
      {confirm.isSuccess ? (
        <p role="status" className="text-sm text-ink">
          Your password is set. <Link to="/sign-in" className="text-accent underline">Sign in</Link> with it.
        </p>
      ) : (
        <form onSubmit={submit} className="flex flex-col gap-4">
          <TextField id="new-password" label="New password" type="password" autoComplete="new-password" required minLength={10} hint="At least 10 characters" value={password} onChange={(event) => setPassword(event.target.value)} error={fieldError} />
          {confirm.error && !fieldError && <ErrorNotice message={messageOf(confirm.error)} />}
          <Button type="submit" variant="primary" pending={confirm.isPending} disabled={!token}>Set password</Button>
        </form>
      )}
    </main>
  );
}
