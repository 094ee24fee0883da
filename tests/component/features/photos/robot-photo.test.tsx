import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { RobotPhotoControl } from '@/features/photos/components/robot-photo';
import { renderScreen, robotOf, routeFetch } from '../../support/route-fetch';

describe('the photo control', () => {
  it('uploads the chosen image as the photo field with PUT', async () => {
    const { calls } = routeFetch({
      'PUT /api/robots/robot-1/photo': [200, { robot: robotOf({ photoUrl: '/api/robots/robot-1/photo?v=1' }) }],
    });
    renderScreen(<RobotPhotoControl robotId="robot-1" name="Greenhouse Cart" photoUrl={null} canEdit />);
    const photo = new File([new Uint8Array([0x89, 0x50, 0x4e, 0x47])], 'cart.png', { type: 'image/png' });
    await userEvent.setup().upload(screen.getByLabelText(/Upload a photo/), photo);
    await waitFor(() => expect(calls).toHaveLength(1));
    expect(((calls[0].body as FormData).get('photo') as File).name).toBe('cart.png');
  });

  it('shows the server’s reason when the file is not an accepted image', async () => {
    routeFetch({
      'PUT /api/robots/robot-1/photo': [
        415,
        {
          error: {
            code: 'unsupported_photo',
            message: 'The photo must be a JPEG, PNG or WebP image; this file is a GIF file',
          },
        },
      ],
    });
    renderScreen(<RobotPhotoControl robotId="robot-1" name="Greenhouse Cart" photoUrl={null} canEdit />);
    await userEvent
      .setup()
      .upload(screen.getByLabelText(/Upload a photo/), new File(['GIF89a'], 'cart.png', { type: 'image/png' }));
    expect((await screen.findByRole('alert')).textContent).toBe(
      'The photo must be a JPEG, PNG or WebP image; this file is a GIF file',
    );
  });

  it('shows the photo to a viewer without the upload', () => {
    routeFetch({});
    renderScreen(
      <RobotPhotoControl
        robotId="robot-1"
        name="Greenhouse Cart"
        photoUrl="/api/robots/robot-1/photo?v=1"
        canEdit={false}
      />,
    );
    expect(screen.getByRole('img', { name: 'Photo of Greenhouse Cart' }).getAttribute('src')).toBe(
      '/api/robots/robot-1/photo?v=1',
    );
    expect(screen.queryByLabelText(/photo \(JPEG/)).toBeNull();
  });
});
