import { cleanup, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { SignUpForm } from '@/features/auth/components/sign-up-form';
import { answerFetch, renderWithQuery } from '../../support/render';

afterEach(cleanup);

async function fillAndSubmit() {
  const user = userEvent.setup();
  await user.type(screen.getByLabelText('Your name'), 'Ada Tinker');
  await user.type(screen.getByLabelText('E-mail'), 'ada@example.org');
  await user.type(screen.getByLabelText('Password'), 'a long enough password');
  await user.click(screen.getByRole('button', { name: 'Create account' }));
}

describe('the sign-up form', () => {
  it('shows the schema reason beside a field before anything is sent', async () => {
    const { calls } = answerFetch(201, {});
    renderWithQuery(<SignUpForm onSignedUp={() => {}} />);
    const user = userEvent.setup();
    await user.type(screen.getByLabelText('Password'), 'short');
    await user.click(screen.getByRole('button', { name: 'Create account' }));
    const password = screen.getByLabelText('Password');
    await waitFor(() => expect(password.getAttribute('aria-invalid')).toBe('true'));
    expect(screen.getByText('Use at least 10 characters').id).toBe(password.getAttribute('aria-describedby'));
    expect(calls).toHaveLength(0);
  });

  it('puts the server reason for a field beside that field', async () => {
    answerFetch(409, {
      error: {
        code: 'email_taken',
        message: 'An account with this e-mail already exists; sign in instead',
        fields: { email: 'An account with this e-mail already exists' },
      },
    });
    renderWithQuery(<SignUpForm onSignedUp={() => {}} />);
    await fillAndSubmit();
    const email = screen.getByLabelText('E-mail');
    await waitFor(() => expect(email.getAttribute('aria-invalid')).toBe('true'));
    expect(screen.getByText('An account with this e-mail already exists').id).toBe(
      email.getAttribute('aria-describedby'),
    );
  });

  it('shows a server error that names no field at the top of the form', async () => {
    answerFetch(429, {
      error: { code: 'rate_limited', message: 'Too many sign-in attempts; try again in 15 minutes' },
    });
    renderWithQuery(<SignUpForm onSignedUp={() => {}} />);
    await fillAndSubmit();
    expect((await screen.findByRole('alert')).textContent).toBe('Too many sign-in attempts; try again in 15 minutes');
  });

  it('sends the trimmed, lower-cased values and reports the new user', async () => {
    const { calls } = answerFetch(201, { user: { id: 'u1', email: 'ada@example.org', name: 'Ada Tinker' } });
    const onSignedUp = vi.fn();
    renderWithQuery(<SignUpForm onSignedUp={onSignedUp} />);
    await fillAndSubmit();
    await waitFor(() =>
      expect(onSignedUp).toHaveBeenCalledWith({ id: 'u1', email: 'ada@example.org', name: 'Ada Tinker' }),
    );
    expect(calls[0].url).toBe('/api/auth/sign-up');
    expect(JSON.parse(String(calls[0].init?.body))).toEqual({
      name: 'Ada Tinker',
      email: 'ada@example.org',
      password: 'a long enough password',
    });
  });
});
