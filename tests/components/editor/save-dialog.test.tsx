import { fireEvent, screen, waitFor } from '@testing-library/react-native';
import { api, ApiRequestError } from '@/lib/api/client';
import { harborRoadV2 } from '@/shared/fixtures/harbor-road';
import { editorStore, selectDirty } from '@/lib/editor/store';
import { SaveDialog } from '@/components/editor/SaveDialog';
import { demoUsers, renderWithClient } from '../helpers/render';

jest.mock('@/lib/api/client', () => require('../helpers/mock-client').clientModule());
const post = api.post as jest.Mock;
const get = api.get as jest.Mock;

const summary = { errors: 0, warnings: 0, singlePointsOfFailure: 0, hosts: 6, redundantHosts: 6 };
const version = (number: number, document = harborRoadV2()) => ({
  number,
  message: 'Theo’s change',
  author: { id: 3, name: 'Theo Brandt' },
  createdAt: '2026-11-30T10:00:00.000Z',
  summary,
  contentHash: 'x',
  review: { state: 'draft', events: [] },
  document,
});

beforeEach(() => {
  post.mockReset();
  get.mockReset();
  editorStore.getState().load(harborRoadV2(), { designId: 1, baseVersion: 2 });
  editorStore.getState().run('renameDevice', { id: 'wms-db-1', name: 'wms-db-primary' });
});

describe('saving a version', () => {
  it('asks for a message, posts the working document on its base version, and marks it saved', async () => {
    post.mockResolvedValueOnce({ version: { ...version(3), document: undefined } });
    const onSaved = jest.fn();
    renderWithClient(<SaveDialog designId={1} wide onClose={jest.fn()} onSaved={onSaved} onOpenVersion={jest.fn()} />, { user: demoUsers.designer });
    fireEvent.press(screen.getByTestId('save-submit'));
    expect(screen.getByTestId('save-message-error')).toHaveTextContent('Say what changed in this version.');
    fireEvent.changeText(screen.getByTestId('save-message'), 'Rename wms-db-1');
    fireEvent.press(screen.getByTestId('save-submit'));
    await waitFor(() => expect(onSaved).toHaveBeenCalledWith(3));
    expect(post).toHaveBeenCalledWith('/api/designs/1/versions', { baseVersion: 2, message: 'Rename wms-db-1', document: editorStore.getState().doc });
    expect([editorStore.getState().baseVersion, selectDirty(editorStore.getState())]).toEqual([3, false]);
  });

  it('explains a 409, shows what the newer version differs in, and saves on top of it', async () => {
    const theirs = harborRoadV2();
    theirs.name = 'Harbor Road (Theo)';
    post.mockRejectedValueOnce(new ApiRequestError(409, { error: 'Version 3 is the latest.', latestVersion: 3 }));
    get.mockResolvedValueOnce({ version: version(3, theirs) });
    renderWithClient(<SaveDialog designId={1} wide onClose={jest.fn()} onSaved={jest.fn()} onOpenVersion={jest.fn()} />, { user: demoUsers.designer });
    fireEvent.changeText(screen.getByTestId('save-message'), 'Rename wms-db-1');
    fireEvent.press(screen.getByTestId('save-submit'));
    // The panel appears with the 409 and names the author once version 3 has loaded: wait for both.
    await waitFor(() => expect(screen.getByTestId('save-conflict')).toHaveTextContent(/Theo Brandt saved version 3/));
    const diff = await screen.findByTestId('diff-summary');
    expect(diff).toHaveTextContent(/design name: Harbor Road \(Theo\) → Harbor Road storage/);
    expect(diff).toHaveTextContent(/wms-db-1/);
    post.mockResolvedValueOnce({ version: { ...version(4), document: undefined } });
    fireEvent.press(screen.getByTestId('conflict-save-on-top'));
    await waitFor(() => expect(post).toHaveBeenLastCalledWith('/api/designs/1/versions', expect.objectContaining({ baseVersion: 3 })));
    expect(get).toHaveBeenCalledWith('/api/designs/1/versions/3');
  });
});
