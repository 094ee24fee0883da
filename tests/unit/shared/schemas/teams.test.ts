import { describe, expect, it } from 'vitest';
import { InviteMemberInputSchema, ROLES, roleAtLeast, type Role } from '@shared/schemas/teams';

describe('roles', () => {
  const table: [Role, Role, boolean][] = [
    ['viewer', 'viewer', true],
    ['viewer', 'editor', false],
    ['viewer', 'owner', false],
    ['editor', 'viewer', true],
    ['editor', 'editor', true],
    ['editor', 'owner', false],
    ['owner', 'viewer', true],
    ['owner', 'editor', true],
    ['owner', 'owner', true],
  ];
  it.each(table)('%s meets the %s minimum: %s', (role, minimum, expected) => {
    expect(roleAtLeast(role, minimum)).toBe(expected);
  });

  it('has exactly three roles', () => {
    expect(ROLES).toEqual(['owner', 'editor', 'viewer']);
  });

  it('refuses to invite with a role that does not exist', () => {
    const result = InviteMemberInputSchema.safeParse({ email: 'a@example.org', role: 'admin' });
    expect(result.error?.issues[0]).toMatchObject({ path: ['role'], message: 'Choose owner, editor or viewer' });
  });
});
