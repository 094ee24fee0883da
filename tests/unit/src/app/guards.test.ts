import { describe, expect, it } from 'vitest';
import { safeNext } from '@/app/guards';

describe('where to go after signing in', () => {
  it('follows a path on this site', () => {
    expect(safeNext('/invitations/abc?x=1')).toBe('/invitations/abc?x=1');
  });

  it.each(['https://elsewhere.example/', '//elsewhere.example', '/\\elsewhere.example', 'teams', null, ''])(
    'ignores %s and goes to the teams page',
    (next) => {
      expect(safeNext(next)).toBe('/teams');
    },
  );
});
