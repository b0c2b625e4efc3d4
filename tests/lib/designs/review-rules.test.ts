import { commentProblem, reviewOptions } from '@/lib/designs/review-rules';
import type { VersionSummary } from '@/shared/api/designs';

function version(state: VersionSummary['review']['state'], authorId: number, errors = 0, number = 2): VersionSummary {
  return {
    number,
    message: 'm',
    author: { id: authorId, name: 'someone' },
    createdAt: '2026-11-25T10:00:00.000Z',
    summary: { errors, warnings: 0, singlePointsOfFailure: 0, hosts: 6, redundantHosts: 6 },
    contentHash: 'h',
    review: { state, events: [] },
  };
}

const designer = { id: 2, role: 'designer' as const };
const reviewer = { id: 3, role: 'reviewer' as const };
const admin = { id: 1, role: 'admin' as const };
const installer = { id: 4, role: 'installer' as const };

describe('review steps per role (docs/api.md role table)', () => {
  it('lets designers and admins submit only the latest draft', () => {
    expect(reviewOptions(designer, version('draft', 2), 2).submit).toBe(true);
    expect(reviewOptions(admin, version('draft', 2), 2).submit).toBe(true);
    expect(reviewOptions(designer, version('draft', 2, 0, 1), 2)).toMatchObject({ submit: false, note: expect.stringMatching(/submit the latest/) });
    expect(reviewOptions(designer, version('in-review', 2), 2).submit).toBe(false);
    expect(reviewOptions(reviewer, version('draft', 2), 2).submit).toBe(false);
  });

  it('lets reviewers and admins decide on a version in review that someone else saved', () => {
    expect(reviewOptions(reviewer, version('in-review', 2), 2).decide).toBe(true);
    expect(reviewOptions(admin, version('in-review', 2), 2).decide).toBe(true);
    expect(reviewOptions(admin, version('in-review', 1), 2)).toMatchObject({ decide: false, note: expect.stringMatching(/yourself/) });
    expect(reviewOptions(reviewer, version('approved', 2), 2).decide).toBe(false);
    expect(reviewOptions(installer, version('in-review', 2), 2)).toEqual({ submit: false, decide: false, note: null, overrideErrors: null });
  });

  it('asks for an override comment only when the version has errors', () => {
    expect(reviewOptions(reviewer, version('in-review', 2, 3), 2).overrideErrors).toBe(3);
    expect(reviewOptions(reviewer, version('in-review', 2, 0), 2).overrideErrors).toBeNull();
    expect(commentProblem('approve', '', 3)).toBe('Explain why you approve a version with 3 errors');
    expect(commentProblem('approve', '  ', null)).toBeNull();
    expect(commentProblem('request-changes', ' ', null)).toMatch(/Say what should change/);
    expect(commentProblem('submit', '', 2)).toBeNull();
  });
});
