import { useState, type FormEvent } from 'react';
import { Link } from 'react-router';
import { Button, ErrorNotice, TextField } from '@/components/ui';
import { messageOf } from '@/lib/formErrors';
import { useRequestPasswordReset } from '../api/passwordReset';

export default function ForgotPasswordPage() {
  const request = useRequestPasswordReset();
  const [email, setEmail] = useState('');
  const submit = (event: FormEvent) => {
    event.preventDefault();
    request.mutate(email);
  };
  return (
    <main id="main" className="mx-auto flex min-h-dvh max-w-sm flex-col justify-center gap-6 px-6">
      <h1 className="text-2xl font-semibold text-ink">Reset your password</h1>
      {request.isSuccess ? (
        <p role="status" className="text-sm text-ink">{request.data}</p>
      ) : (
        <form onSubmit={submit} className="flex flex-col gap-4">
          <TextField id="reset-email" label="Email" type="email" autoComplete="email" required value={email} onChange={(event) => setEmail(event.target.value)} />
          {request.error && <ErrorNotice message={messageOf(request.error)} />}
          <Button type="submit" variant="primary" pending={request.isPending}>Send reset link</Button>
        </form>
      )}
      <Link to="/sign-in" className="text-sm text-accent underline">Back to sign in</Link>
    </main>
  );
}
