import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { FormError } from '@/components/ui/form-error';
import { errorMessage } from '@/lib/api-client';
import { useDeleteRobot } from '../api/delete-robot';

/** Moves the robot to the team's bin (owners); it can be restored there for 30 days. */
export function DeleteRobotButton({
  robotId,
  teamId,
  name,
  onDeleted,
}: {
  robotId: string;
  teamId: string;
  name: string;
  onDeleted?: () => void;
}) {
  const [confirming, setConfirming] = useState(false);
  const remove = useDeleteRobot(robotId, teamId);
  if (!confirming) {
    return (
      <Button variant="danger" onClick={() => setConfirming(true)}>
        Move {name} to the bin
      </Button>
    );
  }
  return (
    <div role="group" aria-label="Confirm moving the robot to the bin" className="space-y-2">
      <p>
        {name} disappears from the team’s lists. Its revisions and flash log are kept, and an owner can restore it from
        the bin for 30 days.
      </p>
      <div className="flex gap-2">
        <Button
          variant="danger"
          busy={remove.isPending}
          onClick={() => remove.mutate(undefined, { onSuccess: onDeleted })}
        >
          Yes, move it to the bin
        </Button>
        <Button variant="quiet" onClick={() => setConfirming(false)}>
          Keep it
        </Button>
      </div>
      <FormError message={remove.isError ? errorMessage(remove.error) : undefined} />
    </div>
  );
}
