import { fireEvent, screen, waitFor, within } from '@testing-library/react-native';
import { DesignScreen } from '@/components/designs/DesignScreen';
import { UploadVersion } from '@/components/versions/UploadVersion';
import { api, ApiRequestError } from '@/lib/api/client';
import { readTopologyText } from '@/lib/import';
import type { User } from '@/shared/api/auth';
import { designResponse, docs, event, people, versionSummary } from './helpers';
import { renderWithClient } from '../helpers/render';

jest.mock('@/lib/api/client', () => require('../helpers/mock-client').clientModule());
jest.mock('expo-router', () => ({ Link: ({ children }: { children: React.ReactNode }) => children }));
jest.mock('react-native/Libraries/Utilities/useWindowDimensions', () => ({ __esModule: true, default: jest.fn() }));
const dimensions: jest.Mock = jest.requireMock('react-native/Libraries/Utilities/useWindowDimensions').default;
const get = api.get as jest.Mock;
const post = api.post as jest.Mock;

const V1 = versionSummary({ number: 1, doc: docs.v1, state: 'changes-requested', message: 'First layout', events: [event(1, 'submit', people.designer), event(2, 'request-changes', people.reviewer, 'Cable cam-rec-2 to fab-b')] });
const V2 = versionSummary({ number: 2, doc: docs.v2, message: 'cam-rec-2 on both fabrics' });

function renderDesign(user: User, width: number, selected: number | null = null, onSelect = jest.fn()) {
  dimensions.mockReturnValue({ width, height: 900, scale: 1, fontScale: 1 });
  get.mockImplementation(async (path: string) => {
    if (path === '/api/designs/1') return designResponse([V2, V1], { status: 'changes-requested', approvedVersion: null });
    throw new Error(`unexpected request ${path}`);
  });
  renderWithClient(<DesignScreen id={1} selected={selected} onSelect={onSelect} />, { user });
  return onSelect;
}

beforeEach(() => {
  get.mockReset();
  post.mockReset();
});

describe('design screen', () => {
  it('shows the versions newest first with message, author, summary and review state, the latest selected', async () => {
    renderDesign(people.reviewer, 1440);
    const list = await screen.findByTestId('version-list');
    const rows = within(list).getAllByTestId(/^version-\d+$/);
    expect(rows.map((r) => r.props.testID)).toEqual(['version-2', 'version-1']);
    expect(within(list).getByTestId('version-1')).toHaveTextContent(/First layout.*Ravi Menon/);
    expect(within(list).getByTestId('version-1-state')).toHaveTextContent('Changes asked');
    expect(within(list).getByTestId('version-2-state')).toHaveTextContent('Draft');
    expect(screen.getByTestId('version-panel')).toHaveTextContent(/Version 2 \(latest\)/);
  });

  it('heads a design whose approved version 3 is followed by a draft 4 with both', async () => {
    const V3 = versionSummary({ number: 3, doc: docs.v2, state: 'approved', message: 'Spare port labelled', events: [event(3, 'submit', people.designer), event(4, 'approve', people.reviewer)] });
    const V4 = versionSummary({ number: 4, doc: docs.v2, message: 'Next step' });
    dimensions.mockReturnValue({ width: 390, height: 844, scale: 1, fontScale: 1 });
    get.mockImplementation(async (path: string) => {
      if (path === '/api/designs/1') return designResponse([V4, V3, V2, V1], { status: 'approved', approvedVersion: { number: 3, approvedAt: V3.createdAt } });
      throw new Error(`unexpected request ${path}`);
    });
    renderWithClient(<DesignScreen id={1} selected={null} onSelect={jest.fn()} />, { user: people.designer });
    const status = await screen.findByTestId('design-status');
    expect(status.props['aria-label']).toBe('Approved v3 · draft v4');
    expect(status).toHaveTextContent('Approved v3·draft v4');
  });

  it('offers a blank design’s editor first, and a file second', async () => {
    dimensions.mockReturnValue({ width: 390, height: 844, scale: 1, fontScale: 1 });
    get.mockImplementation(async (path: string) => {
      if (path === '/api/designs/1') return designResponse([], { status: 'draft', approvedVersion: null });
      throw new Error(`unexpected request ${path}`);
    });
    renderWithClient(<DesignScreen id={1} selected={null} onSelect={jest.fn()} />, { user: people.designer });
    const empty = await screen.findByTestId('design-no-versions');
    expect(empty).toHaveTextContent(/^No versions yetDraw this design on the canvas/);
    const actions = within(empty).getAllByRole('button').map((b) => b.props.testID);
    expect(actions).toEqual(['design-no-versions-edit', 'design-no-versions-upload']);
    expect(screen.getByTestId('design-status').props['aria-label']).toBe('Draft');
    expect(screen.queryByTestId('design-edit')).toBeNull(); // offered once, in the empty state
    fireEvent.press(screen.getByTestId('design-no-versions-upload'));
    expect(await screen.findByTestId('upload-file-pick')).toBeOnTheScreen();
  });

  it('opens the picked version in the detail panel with its review thread', async () => {
    const onSelect = renderDesign(people.reviewer, 1440, 1);
    expect(await screen.findByTestId('version-panel')).toHaveTextContent(/Version 1/);
    expect(screen.getByTestId('review-thread')).toHaveTextContent(/Theo Brandt asked for changes.*Cable cam-rec-2 to fab-b/);
    fireEvent.press(screen.getByTestId('version-2-open'));
    expect(onSelect).toHaveBeenCalledWith(2);
  });

  it('puts the selected version under its own row on a phone', async () => {
    renderDesign(people.designer, 390, 1);
    const row = await screen.findByTestId('version-1');
    expect(within(row).getByTestId('version-panel')).toBeOnTheScreen();
    expect(within(screen.getByTestId('version-2')).queryByTestId('version-panel')).toBeNull();
  });

  it('links to the comparison once two versions are ticked', async () => {
    renderDesign(people.reviewer, 1440);
    fireEvent.press(await screen.findByTestId('version-2-compare'));
    expect(screen.getByTestId('compare-bar')).toHaveTextContent(/Version 2 picked. Pick one more version to compare with it./);
    fireEvent.press(screen.getByTestId('version-1-compare'));
    expect(screen.getByTestId('compare-open')).toHaveTextContent('Compare version 1 with 2');
  });

  it('restores an old version with a message as a new version', async () => {
    post.mockResolvedValueOnce({ version: { ...V1, number: 3 } });
    const onSelect = renderDesign(people.designer, 1440, 1);
    fireEvent.press(await screen.findByTestId('version-restore'));
    expect(screen.getByTestId('restore-form')).toHaveTextContent(/becomes version 3/);
    fireEvent.changeText(screen.getByTestId('restore-message'), 'Back to the first layout for a comparison');
    fireEvent.press(screen.getByTestId('restore-confirm'));
    await waitFor(() => expect(post).toHaveBeenCalledWith('/api/designs/1/versions/1/restore', { message: 'Back to the first layout for a comparison' }));
    await waitFor(() => expect(onSelect).toHaveBeenCalledWith(3));
  });

  it('offers no restore, upload or submit to a reviewer', async () => {
    renderDesign(people.reviewer, 1440, 1);
    await screen.findByTestId('version-panel');
    expect(screen.queryByTestId('version-restore')).toBeNull();
    expect(screen.queryByTestId('design-upload')).toBeNull();
    expect(screen.queryByTestId('review-submit')).toBeNull();
  });

  it('opens the canvas for editing to a designer and read-only to a reviewer', async () => {
    renderDesign(people.designer, 1440);
    await screen.findByTestId('version-panel');
    expect(screen.getByTestId('design-edit')).toBeTruthy();
    expect(screen.queryByTestId('design-view-canvas')).toBeNull();
    screen.unmount();
    renderDesign(people.reviewer, 1440);
    await screen.findByTestId('version-panel');
    expect(screen.getByTestId('design-view-canvas')).toBeTruthy();
    expect(screen.queryByTestId('design-edit')).toBeNull();
  });
});

describe('upload a document as a new version', () => {
  const pick = async () => readTopologyText('harbor-road-v2.json', JSON.stringify(docs.v2));

  it('saves the file on top of the latest version the screen knows', async () => {
    post.mockResolvedValueOnce({ version: { ...V2, number: 3 } });
    const onSaved = jest.fn();
    renderWithClient(<UploadVersion designId={1} latestNumber={2} onSaved={onSaved} onClose={jest.fn()} pickFile={pick} />, { user: people.designer });
    fireEvent.press(screen.getByTestId('upload-file-pick'));
    await screen.findByTestId('upload-file-preview');
    fireEvent.changeText(screen.getByTestId('upload-message'), 'Second cable for cam-rec-2');
    fireEvent.press(screen.getByTestId('upload-save'));
    await waitFor(() => expect(post).toHaveBeenCalledWith('/api/designs/1/versions', { baseVersion: 2, message: 'Second cable for cam-rec-2', document: docs.v2 }));
    await waitFor(() => expect(onSaved).toHaveBeenCalledWith(3));
  });

  it('explains a 409: someone saved a newer version, and the file and message are kept', async () => {
    post.mockRejectedValueOnce(
      new ApiRequestError(409, { error: 'Version 3 was saved since you opened this design. Open version 3, apply your changes there and save again.', latestVersion: 3 }),
    );
    renderWithClient(<UploadVersion designId={1} latestNumber={2} onSaved={jest.fn()} onClose={jest.fn()} pickFile={pick} />, { user: people.designer });
    fireEvent.press(screen.getByTestId('upload-file-pick'));
    await screen.findByTestId('upload-file-preview');
    fireEvent.changeText(screen.getByTestId('upload-message'), 'Second cable for cam-rec-2');
    fireEvent.press(screen.getByTestId('upload-save'));
    const banner = await screen.findByTestId('upload-error');
    expect(banner).toHaveTextContent(/Someone saved a newer version/);
    expect(banner).toHaveTextContent(/Version 3 was saved since you opened this design/);
    expect(screen.getByTestId('upload-message').props.value).toBe('Second cable for cam-rec-2');
    expect(screen.getByTestId('upload-file-preview')).toBeOnTheScreen();
  });

  it('needs a file and a message before saving', () => {
    renderWithClient(<UploadVersion designId={1} latestNumber={2} onSaved={jest.fn()} onClose={jest.fn()} pickFile={pick} />, { user: people.designer });
    fireEvent.press(screen.getByTestId('upload-save'));
    expect(screen.getByTestId('upload-file-error')).toHaveTextContent('Choose a topology file that passes the checks');
    expect(screen.getByTestId('upload-message-error')).toHaveTextContent('Say what changed in this version');
    expect(post).not.toHaveBeenCalled();
  });
});
