import { fireEvent, screen, waitFor } from '@testing-library/react-native';
import { ReviewPanel } from '@/components/review/ReviewPanel';
import { api, ApiRequestError } from '@/lib/api/client';
import type { User } from '@/shared/api/auth';
import type { VersionSummary } from '@/shared/api/designs';
import { docs, event, people, versionSummary } from './helpers';
import { renderWithClient } from '../helpers/render';

jest.mock('@/lib/api/client', () => require('../helpers/mock-client').clientModule());
const post = api.post as jest.Mock;

function renderPanel(viewer: User, version: VersionSummary, latestNumber = version.number) {
  return renderWithClient(<ReviewPanel designId={1} version={version} latestNumber={latestNumber} viewer={viewer} />, { user: viewer });
}

const draft = versionSummary({ number: 2, doc: docs.v2 });
const inReview = versionSummary({ number: 2, doc: docs.v2, state: 'in-review', events: [event(1, 'submit', people.designer, 'Ready for a look')] });
// Version 1 of the demo has errors (docs/demo.md: cam-rec-2 on one switch, a management port on fab-b).
const flawedInReview = versionSummary({ number: 1, doc: docs.v1, state: 'in-review', events: [event(1, 'submit', people.designer)] });

beforeEach(() => post.mockReset());

describe('review panel', () => {
  it('offers a designer Submit on the latest draft and nothing to approve', () => {
    renderPanel(people.designer, draft);
    expect(screen.getByTestId('review-submit')).toBeOnTheScreen();
    expect(screen.queryByTestId('review-approve')).toBeNull();
    expect(screen.queryByTestId('review-request-changes')).toBeNull();
  });

  it('explains instead of offering Submit on a draft a newer version replaced', () => {
    renderPanel(people.designer, versionSummary({ number: 1, doc: docs.v1 }), 2);
    expect(screen.queryByTestId('review-submit')).toBeNull();
    expect(screen.getByTestId('review-note')).toHaveTextContent('Version 1 was followed by version 2; submit the latest version instead.');
  });

  it('offers a reviewer Approve and Ask for changes on a version in review, and no Submit', () => {
    renderPanel(people.reviewer, inReview);
    expect(screen.getByTestId('review-approve')).toBeOnTheScreen();
    expect(screen.getByTestId('review-request-changes')).toBeOnTheScreen();
    expect(screen.queryByTestId('review-submit')).toBeNull();
    expect(screen.getByTestId('review-thread')).toHaveTextContent(/Ravi Menon submitted it for review/);
    expect(screen.getByTestId('review-thread')).toHaveTextContent(/Ready for a look/);
  });

  it('hides Approve from the admin who saved the version and says why', () => {
    const own = versionSummary({ number: 2, doc: docs.v2, author: people.admin, state: 'in-review', events: [event(1, 'submit', people.admin)] });
    renderPanel(people.admin, own);
    expect(screen.queryByTestId('review-approve')).toBeNull();
    expect(screen.queryByTestId('review-request-changes')).toBeNull();
    expect(screen.getByTestId('review-note')).toHaveTextContent('You saved version 2 yourself, so someone else on the team reviews it.');
  });

  it('gives an installer no review steps at all', () => {
    renderPanel(people.installer, inReview);
    expect(screen.queryByTestId('review-actions')).toBeNull();
    expect(screen.queryByTestId('review-note')).toBeNull();
  });

  it('sends a submit with the optional comment', async () => {
    post.mockResolvedValueOnce({ review: { state: 'in-review', events: [] }, design: {} });
    renderPanel(people.designer, draft);
    fireEvent.changeText(screen.getByTestId('review-comment'), 'Cabling for cam-rec-2 fixed');
    fireEvent.press(screen.getByTestId('review-submit'));
    await waitFor(() => expect(post).toHaveBeenCalledWith('/api/designs/1/versions/2/review', { action: 'submit', comment: 'Cabling for cam-rec-2 fixed' }));
  });

  it('asks for a comment before sending a version back', () => {
    renderPanel(people.reviewer, inReview);
    fireEvent.press(screen.getByTestId('review-request-changes'));
    expect(screen.getByTestId('review-comment-error')).toHaveTextContent('Say what should change, so the designer knows what to fix');
    expect(post).not.toHaveBeenCalled();
  });

  it('shows the error count and needs an override comment to approve a version with errors', async () => {
    renderPanel(people.reviewer, flawedInReview);
    const errors = flawedInReview.summary.errors;
    expect(errors).toBeGreaterThan(0);
    expect(screen.getByTestId('review-override-warning')).toHaveTextContent(new RegExp(`found ${errors} errors? in this version`));
    // The field's hint agrees with the banner: here approving needs a comment too.
    expect(screen.getByTestId('review-comment-hint')).toHaveTextContent(/approve despite the errors/);
    fireEvent.press(screen.getByTestId('review-approve'));
    expect(screen.getByTestId('review-comment-error')).toHaveTextContent(`Explain why you approve a version with ${errors} error${errors === 1 ? '' : 's'}`);
    expect(post).not.toHaveBeenCalled();

    post.mockResolvedValueOnce({ review: { state: 'approved', events: [] }, design: {} });
    fireEvent.changeText(screen.getByTestId('review-comment'), 'Lab rig only; cam-rec-2 is not in service yet');
    fireEvent.press(screen.getByTestId('review-approve'));
    await waitFor(() =>
      expect(post).toHaveBeenCalledWith('/api/designs/1/versions/1/review', { action: 'approve', comment: 'Lab rig only; cam-rec-2 is not in service yet' }),
    );
  });

  it("shows the server's sentence inline when the step is refused in the wrong state", async () => {
    post.mockRejectedValueOnce(new ApiRequestError(409, { error: 'Version 2 is approved; only a version in review can be approved or sent back.' }));
    renderPanel(people.reviewer, inReview);
    fireEvent.press(screen.getByTestId('review-approve'));
    expect(await screen.findByTestId('review-error')).toHaveTextContent(/only a version in review can be approved/);
  });

  it('marks an approval over errors as an override in the thread', () => {
    const approved = versionSummary({
      number: 1,
      doc: docs.v1,
      state: 'approved',
      events: [event(1, 'submit', people.designer), event(2, 'approve', people.reviewer, 'Accepted for the lab', true)],
    });
    renderPanel(people.reviewer, approved);
    expect(screen.getByTestId('review-event-2')).toHaveTextContent(/Theo Brandt approved it over the analysis errors/);
    expect(screen.getByTestId('review-event-2-override')).toHaveTextContent('Override');
    expect(screen.queryByTestId('review-event-1-override')).toBeNull();
  });
});
