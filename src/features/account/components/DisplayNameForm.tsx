import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { Button, ErrorNotice, TextField } from '@/components/ui';
import type { User } from '@/domain/contracts';
import { applyServerFieldErrors, messageOf } from '@/lib/formErrors';
import { useUpdateMe } from '@/lib/session/updateMe';
import { SavedNote, Section } from './Section';

const displayNameSchema = z.object({
  displayName: z.string().trim().min(1, 'Enter the name others in the shop will see.').max(80, 'Keep the name under 80 characters.'),
});
type DisplayNameValues = z.infer<typeof displayNameSchema>;

export function DisplayNameForm({ user }: { user: User }) {
  const updateMe = useUpdateMe();
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors, isDirty },
  } = useForm<DisplayNameValues>({ resolver: zodResolver(displayNameSchema), defaultValues: { displayName: user.displayName } });

  const onSubmit = handleSubmit((values) =>
    updateMe.mutate(values, {
      onSuccess: (saved) => reset({ displayName: saved.displayName }),
      onError: (error) => applyServerFieldErrors(error, setError, ['displayName']),
    }),
  );

  return (
    <Section id="account-profile" title="Profile" description={`Signed in as ${user.email}.`}>
      <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4">
        {updateMe.error && !errors.displayName ? <ErrorNotice title="Not saved" message={messageOf(updateMe.error)} /> : null}
        <TextField id="account-display-name" label="Display name" autoComplete="name" hint="Shown on designs you change, e.g. “updated by …”." error={errors.displayName?.message} {...register('displayName')} />
        <div className="flex items-center gap-3">
          <Button type="submit" variant="primary" pending={updateMe.isPending} disabled={!isDirty}>
            Save name
          </Button>
          {updateMe.isSuccess && !isDirty ? <SavedNote>Saved.</SavedNote> : null}
        </div>
      </form>
    </Section>
  );
}
