import { describe, expect, it } from 'vitest';
import { EmailSchema, LinkTokenSchema, SignInInputSchema, SignUpInputSchema } from '@shared/schemas/auth';

describe('account schemas', () => {
  it('trims and lower-cases e-mail addresses', () => {
    expect(EmailSchema.parse('  Mentor@Larkspur-Makers.Example ')).toBe('mentor@larkspur-makers.example');
  });

  it('rejects an address without a domain', () => {
    const result = EmailSchema.safeParse('mentor@');
    expect(result.success).toBe(false);
    expect(result.error?.issues[0].message).toBe('Enter a valid e-mail address, like name@example.org');
  });

  it('asks for at least 10 characters in a new password', () => {
    const result = SignUpInputSchema.safeParse({ name: 'A', email: 'a@example.org', password: '123456789' });
    expect(result.error?.issues).toEqual([
      expect.objectContaining({ path: ['password'], message: 'Use at least 10 characters' }),
    ]);
  });

  it('accepts any non-empty password when signing in', () => {
    expect(SignInInputSchema.safeParse({ email: 'a@example.org', password: 'x' }).success).toBe(true);
  });

  it('rejects a link token with characters a link never has', () => {
    expect(LinkTokenSchema.safeParse('abc$def/ghi.jklmnopqrstu').success).toBe(false);
    expect(LinkTokenSchema.safeParse('A'.repeat(43)).success).toBe(true);
  });
});
