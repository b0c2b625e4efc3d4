import { act, fireEvent, screen, waitFor } from '@testing-library/react-native';
import { onlineManager } from '@tanstack/react-query';
import { QueueState } from '@/components/build/QueueState';
import { api, ApiRequestError } from '@/lib/api/client';
import { createBuildQueue, type BuildQueue } from '@/lib/build/queue';
import { demoUsers, renderWithClient } from '../helpers/render';

jest.mock('@/lib/api/client', () => require('../helpers/mock-client').clientModule());
const post = api.post as jest.Mock;
const get = api.get as jest.Mock;

let queue: BuildQueue;
const target = { designId: 1, version: 2, userId: demoUsers.installer.id };

beforeEach(() => {
  queue = createBuildQueue();
  onlineManager.setOnline(true);
  post.mockReset();
  get.mockReset();
  get.mockResolvedValue({ build: null });
});

describe('queue state', () => {
  it('says when every mark is on the server', () => {
    renderWithClient(<QueueState queue={queue} />, { user: demoUsers.installer });
    expect(screen.getByTestId('queue-clear')).toHaveTextContent('Every mark from this phone is on the server.');
    expect(screen.queryByTestId('queue-waiting-count')).toBeNull();
  });

  it('counts this account\u2019s waiting marks only, and for one version when asked', () => {
    queue.getState().enqueueMark(target, { cableId: 'c1', state: 'run' });
    queue.getState().enqueueStep(target, { stepId: 's1', done: true });
    queue.getState().enqueueMark({ ...target, version: 3 }, { cableId: 'c1', state: 'run' });
    queue.getState().enqueueMark({ ...target, userId: demoUsers.admin.id }, { cableId: 'c2', state: 'run' });
    const first = renderWithClient(<QueueState queue={queue} designId={1} version={2} />, { user: demoUsers.installer });
    expect(screen.getByTestId('queue-waiting-count')).toHaveTextContent('2 marks waiting to send');
    first.unmount();
    renderWithClient(<QueueState queue={queue} />, { user: demoUsers.installer });
    expect(screen.getByTestId('queue-waiting-count')).toHaveTextContent('3 marks waiting to send');
  });

  it('sends the waiting marks in order on "Send now" and then says they are all on the server', async () => {
    const a = queue.getState().enqueueMark(target, { cableId: 'c1', state: 'run' });
    const b = queue.getState().enqueueMark(target, { cableId: 'c2', state: 'tested' });
    let finish: () => void = () => {};
    post.mockImplementationOnce(() => new Promise<void>((resolve) => (finish = resolve))).mockResolvedValue({ mark: {} });
    renderWithClient(<QueueState queue={queue} />, { user: demoUsers.installer });
    fireEvent.press(screen.getByTestId('queue-send-now'));
    expect(await screen.findByTestId('queue-sending')).toHaveTextContent('Sending…');
    await act(async () => finish());
    await waitFor(() => expect(screen.getByTestId('queue-clear')).toBeOnTheScreen());
    // docs/api.md: marks go to POST …/build/marks with the clientId made when they were queued.
    expect(post.mock.calls.map(([path, body]) => [path, body.clientId])).toEqual([
      ['/api/designs/1/versions/2/build/marks', a.clientId],
      ['/api/designs/1/versions/2/build/marks', b.clientId],
    ]);
  });

  it('shows a refused mark with the server\u2019s sentence, and retries or discards it', async () => {
    queue.getState().enqueueMark(target, { cableId: 'c1', state: 'run' });
    post.mockRejectedValueOnce(new ApiRequestError(409, { error: 'Version 2 is no longer open to marks.' }));
    renderWithClient(<QueueState queue={queue} />, { user: demoUsers.installer });
    fireEvent.press(screen.getByTestId('queue-send-now'));
    expect(await screen.findByTestId('queue-refused-0')).toHaveTextContent(/Not sent: Cable c1: Run.*Version 2 is no longer open to marks\./);
    expect(screen.queryByTestId('queue-waiting-count')).toBeNull();

    post.mockResolvedValueOnce({ mark: {} });
    fireEvent.press(screen.getByTestId('queue-retry-0'));
    await waitFor(() => expect(screen.getByTestId('queue-clear')).toBeOnTheScreen());
    expect(post).toHaveBeenCalledTimes(2);

    act(() => void queue.getState().enqueueMark(target, { cableId: 'c2', state: 'run' }));
    post.mockRejectedValueOnce(new ApiRequestError(404, { error: 'No such version.' }));
    fireEvent.press(screen.getByTestId('queue-send-now'));
    await screen.findByTestId('queue-refused-0');
    fireEvent.press(screen.getByTestId('queue-discard-0'));
    expect(queue.getState().items).toHaveLength(0);
    expect(screen.getByTestId('queue-clear')).toBeOnTheScreen();
  });

  it('keeps marks waiting without a connection and says so', async () => {
    queue.getState().enqueueMark(target, { cableId: 'c1', state: 'run' });
    post.mockRejectedValue(new ApiRequestError(0, { error: 'Cablewright could not reach the server.' }));
    renderWithClient(<QueueState queue={queue} />, { user: demoUsers.installer });
    act(() => onlineManager.setOnline(false));
    expect(screen.getByTestId('queue-offline')).toHaveTextContent(/No connection/);
    fireEvent.press(screen.getByTestId('queue-send-now'));
    await waitFor(() => expect(screen.getByTestId('queue-waiting-count')).toHaveTextContent('1 mark waiting to send'));
    expect(queue.getState().items[0].status).toBe('waiting');
    expect(screen.getByText('No connection; waiting to send.')).toBeOnTheScreen();
  });
});
