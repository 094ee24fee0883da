import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '@/components/ui/button';
import { FormError, FormNotice } from '@/components/ui/form-error';
import { TextField } from '@/components/ui/text-field';
import { submitWithServerErrors } from '@/lib/form-errors';
import { PasswordResetRequestSchema } from '@shared/schemas/auth';
import { useRequestPasswordReset } from '../api/request-password-reset';

type Values = z.input<typeof PasswordResetRequestSchema>;

export function ForgotPasswordForm() {
  const request = useRequestPasswordReset();
  const form = useForm<Values, unknown, z.output<typeof PasswordResetRequestSchema>>({
    resolver: zodResolver(PasswordResetRequestSchema),
    defaultValues: { email: '' },
  });
  const { errors } = form.formState;

  const onSubmit = submitWithServerErrors(form, ['email'], (values) => request.mutateAsync(values));

  if (request.isSuccess) {
    return (
      <FormNotice message="If that e-mail address has an account, a reset link is on its way. It works once, for one hour." />
    );
  }

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      <FormError message={errors.root?.server?.message} />
      <TextField
        label="E-mail"
        type="email"
        autoComplete="email"
        hint="We send a one-time link to choose a new password."
        error={errors.email?.message}
        {...form.register('email')}
      />
      <Button type="submit" busy={form.formState.isSubmitting}>
        Send reset link
      </Button>
    </form>
  );
}
