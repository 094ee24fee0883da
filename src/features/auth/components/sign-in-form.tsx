import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { Link } from 'react-router';
import type { z } from 'zod';
import { Button } from '@/components/ui/button';
import { FormError } from '@/components/ui/form-error';
import { TextField } from '@/components/ui/text-field';
import { submitWithServerErrors } from '@/lib/form-errors';
import { SignInInputSchema, type CurrentUser } from '@shared/schemas/auth';
import { useSignIn } from '../api/sign-in';

type Values = z.input<typeof SignInInputSchema>;

export function SignInForm({
  defaultEmail = '',
  onSignedIn,
}: {
  defaultEmail?: string;
  onSignedIn: (user: CurrentUser) => void;
}) {
  const signIn = useSignIn();
  const form = useForm<Values, unknown, z.output<typeof SignInInputSchema>>({
    resolver: zodResolver(SignInInputSchema),
    defaultValues: { email: defaultEmail, password: '' },
  });
  const { errors } = form.formState;

  const onSubmit = submitWithServerErrors(form, ['email', 'password'], async (values) => {
    onSignedIn((await signIn.mutateAsync(values)).user);
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      <FormError message={errors.root?.server?.message} />
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
        autoComplete="current-password"
        error={errors.password?.message}
        {...form.register('password')}
      />
      <Button type="submit" busy={form.formState.isSubmitting}>
        Sign in
      </Button>
      <Link to="/forgot-password" className="self-start text-sm font-semibold text-accent hover:underline">
        Forgot your password?
      </Link>
    </form>
  );
}
