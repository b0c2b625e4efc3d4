import { inAppPath, splitLinks } from '@/lib/links';

describe('splitLinks', () => {
  it('marks a web address inside a sentence and leaves the closing full stop as text', () => {
    const pieces = splitLinks('Join here: http://localhost:8180/invitations/abc123. It expires in 7 days.');
    expect(pieces).toEqual([
      { kind: 'text', text: 'Join here: ' },
      { kind: 'link', text: 'http://localhost:8180/invitations/abc123', url: 'http://localhost:8180/invitations/abc123' },
      { kind: 'text', text: '. It expires in 7 days.' },
    ]);
  });

  it('returns plain text untouched when there is no address', () => {
    expect(splitLinks('No links here.')).toEqual([{ kind: 'text', text: 'No links here.' }]);
  });
});

describe('inAppPath', () => {
  it('turns an address on the app’s own origin into a path for the router', () => {
    expect(inAppPath('http://localhost:8180/invitations/abc?x=1', 'http://localhost:8180')).toBe('/invitations/abc?x=1');
  });

  it('leaves addresses of other origins to the browser', () => {
    expect(inAppPath('https://example.com/invitations/abc', 'http://localhost:8180')).toBeNull();
    expect(inAppPath('http://localhost:8180/x', null)).toBeNull();
  });
});
