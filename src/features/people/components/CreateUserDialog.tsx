import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { Button, Dialog, DialogActions, ErrorNotice, SelectField, TextField } from '@/components/ui';
import { roleSchema } from '@/domain/contracts';
import { ApiError } from '@/lib/apiClient';
import { applyServerFieldErrors, messageOf } from '@/lib/formErrors';
import { useCreateUser } from '../api/createUser';
import { ROLE_OPTIONS } from './roleOptions';

const createUserSchema = z.object({
  displayName: z.string().trim().min(1, 'Enter the person’s name.').max(80, 'Keep the name under 80 characters.'),
  email: z.string().trim().min(1, 'Enter an email address.').email('Enter an email address like name@example.com.'),
  role: roleSchema,
  password: z.string().min(10, 'Use at least 10 characters.').max(72, 'Use at most 72 characters.'),
});
type CreateUserValues = z.infer<typeof createUserSchema>;
const FIELDS = ['displayName', 'email', 'role', 'password'] as const;

export function CreateUserDialog({ open, onClose }: { open: boolean; onClose: () => void }) {
  return (
    <Dialog open={open} onClose={onClose} title="Add a person" description="They sign in with this email and a first password you pass on to them.">
      <CreateUserForm onDone={onClose} />
    </Dialog>
  );
}

function CreateUserForm({ onDone }: { onDone: () => void }) {
  const createUser = useCreateUser();
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<CreateUserValues>({
    resolver: zodResolver(createUserSchema),
    defaultValues: { displayName: '', email: '', role: 'designer', password: '' },
  });

  const onSubmit = handleSubmit((values) =>
    createUser.mutate(values, {
      onSuccess: onDone,
      onError: (error) => {
        if (error instanceof ApiError && error.code === 'email_taken' && !error.fields.email) {
          setError('email', { type: 'server', message: error.message });
          return;
        }
        applyServerFieldErrors(error, setError, FIELDS);
      },
    }),
  );

  const fieldErrorShown = Object.keys(errors).length > 0;
  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4">
      {createUser.error && !fieldErrorShown ? <ErrorNotice title="Not added" message={messageOf(createUser.error)} /> : null}
      <TextField id="create-user-name" label="Name" autoComplete="off" error={errors.displayName?.message} {...register('displayName')} />
      <TextField id="create-user-email" label="Email" type="email" autoComplete="off" error={errors.email?.message} {...register('email')} />
      <SelectField id="create-user-role" label="Role" options={ROLE_OPTIONS} error={errors.role?.message} {...register('role')} />
      <TextField
        id="create-user-password"
        label="First password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters. They can change it on their Account page."
        error={errors.password?.message}
        {...register('password')}
      />
      <DialogActions>
        <Button variant="secondary" onClick={onDone}>
          Cancel
        </Button>
        <Button type="submit" variant="primary" pending={createUser.isPending}>
          Add person
        </Button>
      </DialogActions>
    </form>
  );
}
