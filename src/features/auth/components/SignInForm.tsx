import { Link } from 'react-router';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { LogIn } from 'lucide-react';
import { Button, ErrorNotice, TextField } from '@/components/ui';
import { ApiError } from '@/lib/apiClient';
import { applyServerFieldErrors, messageOf } from '@/lib/formErrors';
import { useSignIn } from '../api/signIn';
import type { User } from '@/domain/contracts';

const signInFormSchema = z.object({
  email: z.string().trim().min(1, 'Enter your email address.').email('Enter an email address like name@example.com.'),
  password: z.string().min(1, 'Enter your password.'),
});
type SignInFormValues = z.infer<typeof signInFormSchema>;

/** What to say above the form for a refused sign-in; the server's wording wins where it has one. */
function signInFailureMessage(error: unknown): { title: string; message: string } {
  if (error instanceof ApiError && error.code === 'rate_limited') {
    return {
      title: 'Too many attempts',
      message: error.message || 'Too many sign-in attempts. Wait a few minutes, then try again.',
    };
  }
  if (error instanceof ApiError && error.code === 'invalid_credentials') {
    return { title: 'Not signed in', message: error.message };
  }
  return { title: 'Not signed in', message: messageOf(error) };
}

export function SignInForm({ onSignedIn }: { onSignedIn: (user: User) => void }) {
  const signIn = useSignIn();
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<SignInFormValues>({ resolver: zodResolver(signInFormSchema), defaultValues: { email: '', password: '' } });

  const onSubmit = handleSubmit((values) =>
    signIn.mutate(values, {
      onSuccess: onSignedIn,
      onError: (error) => applyServerFieldErrors(error, setError, ['email', 'password']),
    }),
  );

  const failure = signIn.error && !Object.keys(errors).length ? signInFailureMessage(signIn.error) : null;

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-5" aria-label="Sign in">
      {failure ? <ErrorNotice title={failure.title} message={failure.message} /> : null}
      <TextField
        id="sign-in-email"
        label="Email"
        type="email"
        autoComplete="username"
        inputMode="email"
        error={errors.email?.message}
        {...register('email')}
      />
      <TextField
        id="sign-in-password"
        label="Password"
        type="password"
        autoComplete="current-password"
        error={errors.password?.message}
        {...register('password')}
      />
      <Button type="submit" variant="primary" pending={signIn.isPending} icon={<LogIn aria-hidden className="size-4" />} className="w-full">
        Sign in
      </Button>
      <Link to="/forgot-password" className="text-center text-sm text-accent underline-offset-2 hover:underline">
        Forgot your password?
      </Link>
    </form>
  );
}
