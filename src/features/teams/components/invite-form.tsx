import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '@/components/ui/button';
import { FormError, FormNotice } from '@/components/ui/form-error';
import { SelectField } from '@/components/ui/select-field';
import { TextField } from '@/components/ui/text-field';
import { submitWithServerErrors } from '@/lib/form-errors';
import { InviteMemberInputSchema, ROLES, ROLE_SUMMARIES, type InvitationDelivery } from '@shared/schemas/teams';
import { useInviteMember, type CreatedInvitation } from '../api/invite-member';
import { HandDeliveryNotice, InvitationLink } from './hand-delivery';

type Values = z.input<typeof InviteMemberInputSchema>;

const roleOptions = ROLES.map((role) => ({
  value: role,
  label: `${role[0].toUpperCase()}${role.slice(1)} — ${ROLE_SUMMARIES[role].toLowerCase()}`,
}));

export function InviteForm({ teamId, delivery }: { teamId: string; delivery: InvitationDelivery | undefined }) {
  const invite = useInviteMember(teamId);
  const [created, setCreated] = useState<CreatedInvitation | null>(null);
  const form = useForm<Values, unknown, z.output<typeof InviteMemberInputSchema>>({
    resolver: zodResolver(InviteMemberInputSchema),
    defaultValues: { email: '', role: 'viewer' },
  });
  const { errors } = form.formState;

  const onSubmit = submitWithServerErrors(form, ['email', 'role'], async (values) => {
    setCreated(null);
    setCreated(await invite.mutateAsync(values));
    form.reset({ email: '', role: values.role });
  });
  const sentNotice =
    created && !created.link
      ? `Invitation sent to ${created.invitation.email}. The link works once, for 7 days.`
      : undefined;

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-3">
      {delivery === 'by-hand' && <HandDeliveryNotice />}
      <FormError message={errors.root?.server?.message} />
      <FormNotice message={sentNotice} />
      {created?.link && <InvitationLink email={created.invitation.email} link={created.link} />}
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
        {delivery === 'by-hand' ? 'Create invitation link' : 'Send invitation'}
      </Button>
    </form>
  );
}
