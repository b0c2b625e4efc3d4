import { activeNavKey, navItemsFor, safeNextPath } from '@/lib/navigation';

describe('navigation', () => {
  it('gives admins all four destinations and other roles Designs and Account only', () => {
    expect(navItemsFor('admin').map((i) => i.key)).toEqual(['designs', 'team', 'mailbox', 'account']);
    for (const role of ['designer', 'reviewer', 'installer'] as const) {
      expect(navItemsFor(role).map((i) => i.key)).toEqual(['designs', 'account']);
    }
  });

  it('keeps a message of the mailbox under Mailbox', () => {
    expect(activeNavKey('/mailbox/3f2a')).toBe('mailbox');
    expect(activeNavKey('/elsewhere')).toBeNull();
  });

  it('only follows a sign-in "next" that stays inside the app', () => {
    expect(safeNextPath('/team')).toBe('/team');
    expect(safeNextPath('//evil.example/path')).toBeNull();
    expect(safeNextPath('https://evil.example')).toBeNull();
    expect(safeNextPath('/sign-in')).toBeNull();
    expect(safeNextPath(undefined)).toBeNull();
  });
});
