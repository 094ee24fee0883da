import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { Button } from '@/components/ui/button';
import { FormError } from '@/components/ui/form-error';
import { TextField } from '@/components/ui/text-field';
import { submitWithServerErrors } from '@/lib/form-errors';
import { NewPasswordSchema } from '@shared/schemas/auth';
import { useResetPassword } from '../api/reset-password';

const FormSchema = z
  .object({ password: NewPasswordSchema, repeat: z.string().min(1, 'Type the new password again') })
  .refine((v) => v.password === v.repeat, { path: ['repeat'], message: 'The two passwords differ' });
type Values = z.input<typeof FormSchema>;

export function ResetPasswordForm({ token, onDone }: { token: string; onDone: () => void }) {
  const reset = useResetPassword();
  const form = useForm<Values>({ resolver: zodResolver(FormSchema), defaultValues: { password: '', repeat: '' } });
  const { errors } = form.formState;

  const onSubmit = submitWithServerErrors(form, ['password'], async (values) => {
    await reset.mutateAsync({ token, password: values.password });
    onDone();
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      <FormError message={errors.root?.server?.message} />
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters. Every device signed in with the old password is signed out."
        error={errors.password?.message}
        {...form.register('password')}
      />
      <TextField
        label="New password again"
        type="password"
        autoComplete="new-password"
        error={errors.repeat?.message}
        {...form.register('repeat')}
      />
      <Button type="submit" busy={form.formState.isSubmitting}>
        Set new password
      </Button>
    </form>
  );
}
