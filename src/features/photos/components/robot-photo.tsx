import { useId, useRef } from 'react';
import { Button } from '@/components/ui/button';
import { FormError } from '@/components/ui/form-error';
import { errorMessage } from '@/lib/api-client';
import { useRemovePhoto } from '../api/remove-photo';
import { useUploadPhoto } from '../api/upload-photo';

export const PHOTO_ACCEPT = 'image/jpeg,image/png,image/webp';

/** A small square of the robot's photo for lists; nothing when there is none. */
export function RobotPhotoThumb({
  photoUrl,
  name,
  size = 40,
}: {
  photoUrl: string | null;
  name: string;
  size?: number;
}) {
  if (!photoUrl) return null;
  return (
    <img
      src={photoUrl}
      alt={`Photo of ${name}`}
      width={size}
      height={size}
      loading="lazy"
      className="rounded border border-rule object-cover"
      style={{ width: size, height: size }}
    />
  );
}

/** The robot's photo with upload and remove (editors); the server checks the type by content. */
export function RobotPhotoControl({
  robotId,
  name,
  photoUrl,
  canEdit,
}: {
  robotId: string;
  name: string;
  photoUrl: string | null;
  canEdit: boolean;
}) {
  const upload = useUploadPhoto(robotId);
  const remove = useRemovePhoto(robotId);
  const input = useRef<HTMLInputElement>(null);
  const id = useId();
  const error = upload.isError ? upload.error : remove.isError ? remove.error : null;
  return (
    <div className="flex flex-wrap items-start gap-4">
      {photoUrl ? (
        <img src={photoUrl} alt={`Photo of ${name}`} className="h-36 w-48 rounded-md border border-rule object-cover" />
      ) : (
        <div className="flex h-36 w-48 items-center justify-center rounded-md border border-dashed border-rule-strong text-sm text-ink-muted">
          No photo yet
        </div>
      )}
      {canEdit && (
        <div className="flex flex-col gap-2">
          <label htmlFor={id} className="text-sm font-semibold text-ink-soft">
            {photoUrl ? 'Replace the photo' : 'Upload a photo'} (JPEG, PNG or WebP, up to 5 MB)
          </label>
          <input
            ref={input}
            id={id}
            type="file"
            accept={PHOTO_ACCEPT}
            className="text-sm"
            onChange={(e) => {
              const file = e.target.files?.[0];
              if (file) upload.mutate(file, { onSettled: () => input.current && (input.current.value = '') });
            }}
          />
          {upload.isPending && (
            <p role="status" className="text-sm text-ink-muted">
              Uploading…
            </p>
          )}
          {photoUrl && (
            <Button
              variant="quiet"
              size="sm"
              busy={remove.isPending}
              onClick={() => remove.mutate()}
              className="self-start"
            >
              Remove the photo
            </Button>
          )}
          <FormError message={error ? errorMessage(error) : undefined} />
        </div>
      )}
    </div>
  );
}
