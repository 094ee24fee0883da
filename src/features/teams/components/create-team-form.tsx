import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '@/components/ui/button';
import { FormError } from '@/components/ui/form-error';
import { TextField } from '@/components/ui/text-field';
import { submitWithServerErrors } from '@/lib/form-errors';
import { CreateTeamInputSchema, type TeamDetail } from '@shared/schemas/teams';
import { useCreateTeam } from '../api/create-team';

type Values = z.input<typeof CreateTeamInputSchema>;

export function CreateTeamForm({ onCreated }: { onCreated: (team: TeamDetail) => void }) {
  const createTeam = useCreateTeam();
  const form = useForm<Values, unknown, z.output<typeof CreateTeamInputSchema>>({
    resolver: zodResolver(CreateTeamInputSchema),
    defaultValues: { name: '' },
  });
  const { errors } = form.formState;

  const onSubmit = submitWithServerErrors(form, ['name'], async (values) => {
    onCreated(await createTeam.mutateAsync(values));
    form.reset();
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-3">
      <FormError message={errors.root?.server?.message} />
      <TextField
        label="Team name"
        placeholder="e.g. Tuesday robotics club"
        hint="You become its owner and can invite others."
        error={errors.name?.message}
        {...form.register('name')}
      />
      <Button type="submit" busy={form.formState.isSubmitting} className="self-start">
        Create team
      </Button>
    </form>
  );
}
