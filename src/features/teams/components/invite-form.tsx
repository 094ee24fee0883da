import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '@/components/ui/button';
import { FormError, FormNotice } from '@/components/ui/form-error';
import { SelectField } from '@/components/ui/select-field';
import { TextField } from '@/components/ui/text-field';
import { submitWithServerErrors } from '@/lib/form-errors';
import { InviteMemberInputSchema, ROLES, ROLE_SUMMARIES } from '@shared/schemas/teams';
import { useInviteMember } from '../api/invite-member';

type Values = z.input<typeof InviteMemberInputSchema>;

const roleOptions = ROLES.map((role) => ({
  value: role,
  label: `${role[0].toUpperCase()}${role.slice(1)} — ${ROLE_SUMMARIES[role].toLowerCase()}`,
}));

export function InviteForm({ teamId }: { teamId: string }) {
  const invite = useInviteMember(teamId);
  const [sentTo, setSentTo] = useState<string | null>(null);
  const form = useForm<Values, unknown, z.output<typeof InviteMemberInputSchema>>({
    resolver: zodResolver(InviteMemberInputSchema),
    defaultValues: { email: '', role: 'viewer' },
  });
  const { errors } = form.formState;

  const onSubmit = submitWithServerErrors(form, ['email', 'role'], async (values) => {
    setSentTo(null);
    const invitation = await invite.mutateAsync(values);
    setSentTo(invitation.email);
    form.reset({ email: '', role: values.role });
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-3">
      <FormError message={errors.root?.server?.message} />
      <FormNotice message={sentTo ? `Invitation sent to ${sentTo}. The link works once, for 7 days.` : undefined} />
      <div className="grid gap-3 sm:grid-cols-[1fr_minmax(0,18rem)]">
        <TextField
          label="E-mail address"
          type="email"
          autoComplete="off"
          error={errors.email?.message}
          {...form.register('email')}
        />
        <SelectField label="Role" options={roleOptions} error={errors.role?.message} {...form.register('role')} />
      </div>
      <Button type="submit" busy={form.formState.isSubmitting} className="self-start">
        Send invitation
      </Button>
    </form>
  );
}
