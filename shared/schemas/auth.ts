import { z } from 'zod';

// Request bodies for accounts. The sign-in forms, the server's validation and the tests share them.

export const EmailSchema = z
  .string({ error: 'Enter your e-mail address' })
  .trim()
  .toLowerCase()
  .pipe(z.email('Enter a valid e-mail address, like name@example.org').max(254, 'At most 254 characters'));

/**
 * At least 10 characters and no other composition rules: length is what makes a password hard
 * to guess (NIST SP 800-63B §5.1.1.2 asks for at least 8 and no composition rules; from memory).
 * The upper bound keeps hashing time bounded.
 */
export const NewPasswordSchema = z
  .string({ error: 'Choose a password' })
  .min(10, 'Use at least 10 characters')
  .max(200, 'At most 200 characters');

export const PersonNameSchema = z
  .string({ error: 'Enter your name' })
  .trim()
  .min(1, 'Enter your name')
  .max(80, 'At most 80 characters');

export const SignUpInputSchema = z.object({
  name: PersonNameSchema,
  email: EmailSchema,
  password: NewPasswordSchema,
});
export type SignUpInput = z.input<typeof SignUpInputSchema>;

export const SignInInputSchema = z.object({
  email: EmailSchema,
  // No length rule on sign-in: a wrong password gets the same answer as an unknown e-mail.
  password: z.string({ error: 'Enter your password' }).min(1, 'Enter your password').max(200, 'At most 200 characters'),
});
export type SignInInput = z.input<typeof SignInInputSchema>;

export const PasswordResetRequestSchema = z.object({ email: EmailSchema });
export type PasswordResetRequest = z.input<typeof PasswordResetRequestSchema>;

export const LinkTokenSchema = z
  .string({ error: 'The link is incomplete' })
  .max(100, 'The link is incomplete or damaged; open it again from the e-mail')
  .regex(/^[A-Za-z0-9_-]{20,100}$/, 'The link is incomplete or damaged; open it again from the e-mail');

export const PasswordResetInputSchema = z.object({
  token: LinkTokenSchema,
  password: NewPasswordSchema,
});
export type PasswordResetInput = z.input<typeof PasswordResetInputSchema>;

/** The signed-in person, as the API returns it. */
export interface CurrentUser {
  id: string;
  email: string;
  name: string;
}
