import { activeNavKey, navItemsFor, safeNextPath } from '@/lib/navigation';

describe('navigation', () => {
  it('gives admins every destination, installers Site work too, and the others Designs and Account only', () => {
    expect(navItemsFor('admin').map((i) => i.key)).toEqual(['designs', 'site', 'team', 'mailbox', 'account']);
    expect(navItemsFor('installer').map((i) => i.key)).toEqual(['designs', 'site', 'account']);
    for (const role of ['designer', 'reviewer'] as const) {
      expect(navItemsFor(role).map((i) => i.key)).toEqual(['designs', 'account']);
    }
  });

  it('keeps a checklist reached from Site work under its own path', () => {
    expect(activeNavKey('/site')).toBe('site');
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
