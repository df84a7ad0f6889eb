import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { Button, ErrorNotice, TextField } from '@/components/ui';
import { applyServerFieldErrors, messageOf } from '@/lib/formErrors';
import { useChangePassword } from '../api/changePassword';
import { SavedNote, Section } from './Section';

const MIN_PASSWORD_LENGTH = 10;

const changePasswordSchema = z
  .object({
    currentPassword: z.string().min(1, 'Enter your current password.'),
    newPassword: z.string().min(MIN_PASSWORD_LENGTH, `Use at least ${MIN_PASSWORD_LENGTH} characters.`).max(72, 'Use at most 72 characters.'),
    confirmPassword: z.string().min(1, 'Type the new password again.'),
  })
  .refine((values) => values.newPassword === values.confirmPassword, {
    path: ['confirmPassword'],
    message: 'The two new passwords are not the same.',
  });
type ChangePasswordValues = z.infer<typeof changePasswordSchema>;

export function ChangePasswordForm() {
  const changePassword = useChangePassword();
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors, isDirty },
  } = useForm<ChangePasswordValues>({
    resolver: zodResolver(changePasswordSchema),
    defaultValues: { currentPassword: '', newPassword: '', confirmPassword: '' },
  });

  const onSubmit = handleSubmit(({ currentPassword, newPassword }) =>
    changePassword.mutate(
      { currentPassword, newPassword },
      {
        onSuccess: () => reset(),
        onError: (error) => applyServerFieldErrors(error, setError, ['currentPassword', 'newPassword']),
      },
    ),
  );

  const fieldErrorShown = Object.keys(errors).length > 0;
  return (
    <Section id="account-password" title="Password" description={`At least ${MIN_PASSWORD_LENGTH} characters. Other devices where you are signed in will be signed out.`}>
      <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4">
        {changePassword.error && !fieldErrorShown ? <ErrorNotice title="Password not changed" message={messageOf(changePassword.error)} /> : null}
        <TextField id="account-current-password" label="Current password" type="password" autoComplete="current-password" error={errors.currentPassword?.message} {...register('currentPassword')} />
        <TextField id="account-new-password" label="New password" type="password" autoComplete="new-password" error={errors.newPassword?.message} {...register('newPassword')} />
        <TextField id="account-confirm-password" label="New password again" type="password" autoComplete="new-password" error={errors.confirmPassword?.message} {...register('confirmPassword')} />
        <div className="flex items-center gap-3">
          <Button type="submit" variant="primary" pending={changePassword.isPending}>
            Change password
          </Button>
          {changePassword.isSuccess && !isDirty ? <SavedNote>Password changed.</SavedNote> : null}
        </div>
      </form>
    </Section>
  );
}
