import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { zodFields, zodMessage } from '@server/middleware/error-handler';

describe('zod errors as field reasons', () => {
  const Schema = z.object({
    config: z.object({ wheels: z.array(z.object({ radiusMm: z.number().positive('Radius must be more than 0 mm') })) }),
  });

  it('keys each reason by its dotted path', () => {
    const error = Schema.safeParse({ config: { wheels: [{ radiusMm: 3 }, { radiusMm: -1 }] } }).error!;
    expect(zodFields(error)).toEqual({ 'config.wheels.1.radiusMm': 'Radius must be more than 0 mm' });
  });

  it('keeps the first reason when one path has several', () => {
    const error = z
      .object({ name: z.string().min(3, 'Too short').regex(/^x/, 'Must start with x') })
      .safeParse({ name: 'a' }).error!;
    expect(zodFields(error)).toEqual({ name: 'Too short' });
  });

  it('names the first field and counts the others in the message', () => {
    expect(zodMessage({ email: 'Enter your e-mail address', password: 'Choose a password' })).toBe(
      'email: Enter your e-mail address (and 1 more)',
    );
  });
});
