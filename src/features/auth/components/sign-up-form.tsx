import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '@/components/ui/button';
import { FormError } from '@/components/ui/form-error';
import { TextField } from '@/components/ui/text-field';
import { submitWithServerErrors } from '@/lib/form-errors';
import { SignUpInputSchema, type CurrentUser } from '@shared/schemas/auth';
import { useSignUp } from '../api/sign-up';

type Values = z.input<typeof SignUpInputSchema>;

export function SignUpForm({
  defaultEmail = '',
  onSignedUp,
}: {
  defaultEmail?: string;
  onSignedUp: (user: CurrentUser) => void;
}) {
  const signUp = useSignUp();
  const form = useForm<Values, unknown, z.output<typeof SignUpInputSchema>>({
    resolver: zodResolver(SignUpInputSchema),
    defaultValues: { name: '', email: defaultEmail, password: '' },
  });
  const { errors } = form.formState;

  const onSubmit = submitWithServerErrors(form, ['name', 'email', 'password'], async (values) => {
    onSignedUp((await signUp.mutateAsync(values)).user);
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      <FormError message={errors.root?.server?.message} />
      <TextField label="Your name" autoComplete="name" error={errors.name?.message} {...form.register('name')} />
      <TextField
        label="E-mail"
        type="email"
        autoComplete="email"
        error={errors.email?.message}
        {...form.register('email')}
      />
      <TextField
        label="Password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters. A short sentence is easy to remember and hard to guess."
        error={errors.password?.message}
        {...form.register('password')}
      />
      <Button type="submit" busy={form.formState.isSubmitting}>
        Create account
      </Button>
    </form>
  );
}
