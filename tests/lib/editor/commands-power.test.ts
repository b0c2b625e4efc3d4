import { analyze } from '@/shared/analysis/analyze';
import { apply, device, expectValid, refusal, smallDesign } from '@/tests/lib/editor/helpers/editor';

// Power feeds and PSUs (topology-format.md, format 2) edited by command, and read by the analysis.
describe('power commands', () => {
  it('adds feeds and gives a switch two PSUs on them, with ids of their own', () => {
    let doc = apply(smallDesign(), 'addFeed', { name: 'Feed A' });
    doc = apply(doc, 'addFeed', { name: 'Feed B' });
    expect(doc.powerFeeds).toEqual([
      { id: 'feed-feed-a', name: 'Feed A' },
      { id: 'feed-feed-b', name: 'Feed B' },
    ]);
    doc = apply(doc, 'setPsus', { id: 'switch-1', feeds: ['feed-feed-a', 'feed-feed-b'] });
    expectValid(doc);
    expect(device(doc, 'switch-1').psus).toEqual([
      { id: 'switch-1-psu-1', name: 'PSU 1', feedId: 'feed-feed-a' },
      { id: 'switch-1-psu-2', name: 'PSU 2', feedId: 'feed-feed-b' },
    ]);
    // Both on one feed: a finding of the analysis, not a refusal.
    const shared = apply(doc, 'setPsus', { id: 'switch-1', feeds: ['feed-feed-a', 'feed-feed-a'] });
    expect(analyze(shared).findings.some((f) => f.rule === 'psus-one-feed' && f.subjects[0] === 'switch-1')).toBe(true);
    // Existing PSUs keep their ids when their feed changes.
    expect(device(shared, 'switch-1').psus!.map((p) => p.id)).toEqual(['switch-1-psu-1', 'switch-1-psu-2']);
  });

  it('removing a feed leaves its PSUs on no feed, and an empty list removes the PSUs', () => {
    let doc = apply(smallDesign(), 'addFeed', { name: 'Feed A' });
    doc = apply(doc, 'setPsus', { id: 'host-1', feeds: ['feed-feed-a', null] });
    doc = apply(doc, 'removeFeed', { id: 'feed-feed-a' });
    expectValid(doc);
    expect(device(doc, 'host-1').psus).toEqual([
      { id: 'host-1-psu-1', name: 'PSU 1' },
      { id: 'host-1-psu-2', name: 'PSU 2' },
    ]);
    expect(analyze(doc).findings.filter((f) => f.rule === 'psu-no-feed')).toHaveLength(2);
    doc = apply(doc, 'setPsus', { id: 'host-1', feeds: [] });
    expect('psus' in device(doc, 'host-1')).toBe(false);
  });

  it('refuses a feed that does not exist and a feed without a name, naming the field', () => {
    const missing = refusal(() => apply(smallDesign(), 'setPsus', { id: 'switch-1', feeds: ['constructor'] }));
    expect([missing.code, missing.path]).toEqual(['not-found', 'feeds.0']);
    expect(refusal(() => apply(smallDesign(), 'addFeed', { name: '  ' })).path).toBe('name');
  });
});
