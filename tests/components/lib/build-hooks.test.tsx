import type { ReactNode } from 'react';
import { onlineManager, QueryClientProvider } from '@tanstack/react-query';
import { act, renderHook, waitFor } from '@testing-library/react-native';
import { api } from '@/lib/api/client';
import { useQueueSender, useShownBuild } from '@/lib/api/build';
import { authKeys } from '@/lib/api/auth';
import { createBuildQueue } from '@/lib/build/queue';
import { emptyRecord, ownValue } from '@/shared/keys/record';
import type { BuildRecord } from '@/shared/api/build';
import { createTestQueryClient, demoUsers } from '../helpers/render';

jest.mock('@/lib/api/client', () => require('../helpers/mock-client').clientModule());

const post = api.post as jest.Mock;
const get = api.get as jest.Mock;
const INES = demoUsers.installer;
const target = { designId: 1, version: 2, userId: INES.id };

function wrapper() {
  const client = createTestQueryClient();
  client.setQueryData(authKeys.me(), INES);
  const Wrapper = ({ children }: { children: ReactNode }) => <QueryClientProvider client={client}>{children}</QueryClientProvider>;
  return Wrapper;
}

function record(): BuildRecord {
  const cables = emptyRecord<BuildRecord['cables'][string]>();
  cables['cable-a-01'] = { state: 'not-started', note: null, by: null, at: null };
  cables['cable-a-02'] = { state: 'run', note: null, by: { id: 1, name: 'Maya Okafor' }, at: '2026-01-05T09:00:00.000Z' };
  return {
    designId: 1,
    number: 2,
    accepting: true,
    supersededBy: null,
    cables,
    steps: emptyRecord(),
    photos: { cables: emptyRecord(), racks: emptyRecord() },
    progress: { cables: { done: 0, total: 2 }, steps: { done: 0, total: 0 }, states: { 'not-started': 1, run: 1, tested: 0, problem: 0 }, racks: [] },
    complete: false,
    completedAt: null,
  };
}

beforeEach(() => {
  post.mockReset();
  get.mockReset();
  onlineManager.setOnline(true);
});

describe('the queue sender', () => {
  it('waits while offline and sends the queued marks in order when the connection returns', async () => {
    const queue = createBuildQueue();
    const first = queue.getState().enqueueMark(target, { cableId: 'cable-a-01', state: 'run' });
    const second = queue.getState().enqueueStep(target, { stepId: '["safety","briefing"]', done: true });
    onlineManager.setOnline(false);
    post.mockResolvedValue({ mark: {} });
    const hook = renderHook(() => useQueueSender(queue), { wrapper: wrapper() });
    expect(post).not.toHaveBeenCalled();
    await act(async () => onlineManager.setOnline(true));
    await waitFor(() => expect(queue.getState().items).toEqual([]));
    expect(post.mock.calls).toEqual([
      ['/api/designs/1/versions/2/build/marks', { cableId: 'cable-a-01', state: 'run', clientId: first.clientId }],
      ['/api/designs/1/versions/2/build/steps', { stepId: '["safety","briefing"]', done: true, clientId: second.clientId }],
    ]);
    hook.unmount();
  });

  it('sends a mark queued while online at once', async () => {
    const queue = createBuildQueue();
    post.mockResolvedValue({ mark: {} });
    const hook = renderHook(() => useQueueSender(queue), { wrapper: wrapper() });
    await act(async () => void queue.getState().enqueueMark(target, { cableId: 'cable-a-02', state: 'tested' }));
    await waitFor(() => expect(post).toHaveBeenCalledTimes(1));
    await waitFor(() => expect(queue.getState().items).toEqual([]));
    hook.unmount();
  });
});

describe('the record as the phone shows it', () => {
  it('lays the signed-in installer’s queued marks over the server’s record, flagged waiting', async () => {
    const queue = createBuildQueue();
    queue.getState().enqueueMark(target, { cableId: 'cable-a-01', state: 'tested' });
    queue.getState().enqueueMark({ ...target, userId: 1 }, { cableId: 'cable-a-02', state: 'tested' });
    get.mockResolvedValue({ build: record() });
    const hook = renderHook(() => useShownBuild(1, 2, queue), { wrapper: wrapper() });
    await waitFor(() => expect(hook.result.current.shown).toBeDefined());
    const shown = hook.result.current.shown!;
    expect(ownValue(shown.cables, 'cable-a-01')).toMatchObject({ state: 'tested', pending: 'waiting', by: { id: INES.id, name: INES.name } });
    // Another account's queued mark is not this installer's to show.
    expect(ownValue(shown.cables, 'cable-a-02')).toMatchObject({ state: 'run', pending: null });
    expect(shown.waiting).toBe(1);
    expect(get).toHaveBeenCalledWith('/api/designs/1/versions/2/build');
    hook.unmount();
  });
});
