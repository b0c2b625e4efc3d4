import { fireEvent, screen, waitFor, within } from '@testing-library/react-native';
import { DesignsScreen } from '@/components/designs/DesignsScreen';
import { api } from '@/lib/api/client';
import type { User } from '@/shared/api/auth';
import type { DesignListItem } from '@/shared/api/designs';
import { docs, people, versionSummary } from './helpers';
import { renderWithClient } from '../helpers/render';

jest.mock('@/lib/api/client', () => require('../helpers/mock-client').clientModule());
jest.mock('expo-router', () => ({ Link: ({ children }: { children: React.ReactNode }) => children }));
jest.mock('react-native/Libraries/Utilities/useWindowDimensions', () => ({ __esModule: true, default: jest.fn() }));
const dimensions: jest.Mock = jest.requireMock('react-native/Libraries/Utilities/useWindowDimensions').default;
const get = api.get as jest.Mock;

function listItem(id: number, name: string, status: DesignListItem['status'], n: number | null, doc = docs.v2): DesignListItem {
  const latest = n === null ? null : versionSummary({ number: n, doc });
  return {
    id,
    name,
    site: 'Harbor Road server room',
    status,
    latestVersion: latest && { number: latest.number, createdAt: latest.createdAt, summary: latest.summary, review: status },
    approvedVersion: latest && status === 'approved' ? { number: latest.number, approvedAt: '2026-11-26T15:00:00.000Z' } : null,
    updatedAt: '2026-11-26T15:00:00.000Z',
  };
}

const HARBOR = listItem(1, 'Harbor Road storage', 'approved', 2);
const FLAWED = listItem(2, 'Cold room annex', 'changes-requested', 1, docs.v1);
const EMPTY = listItem(3, 'Loading dock', 'draft', null);

function serve(designs: DesignListItem[]) {
  get.mockImplementation(async (path: string) => {
    if (path === '/api/team') return { team: { id: 1, name: 'Tidewater Cold Storage' }, members: [], invitations: [] };
    if (path.startsWith('/api/designs')) {
      const q = new URLSearchParams(path.split('?')[1] ?? '').get('q');
      const matching = q ? designs.filter((d) => d.name.toLowerCase().includes(q.toLowerCase())) : designs;
      return { designs: matching, nextCursor: null, total: matching.length };
    }
    throw new Error(`unexpected request ${path}`);
  });
}

function renderList(user: User, width = 390) {
  dimensions.mockReturnValue({ width, height: 844, scale: 1, fontScale: 1 });
  return renderWithClient(<DesignsScreen />, { user });
}

beforeEach(() => get.mockReset());

describe('designs screen', () => {
  it('lists each design with its status in words, latest version and redundancy summary on a phone', async () => {
    serve([HARBOR, FLAWED, EMPTY]);
    renderList(people.designer);
    const list = await screen.findByTestId('designs-list');
    expect(within(list).getByTestId('design-1-status')).toHaveTextContent('Approved v2');
    expect(within(list).getByTestId('design-2-status')).toHaveTextContent('Changes asked v1');
    expect(within(list).getByTestId('design-3-status')).toHaveTextContent('Draft');
    // docs/demo.md: version 2 makes all six hosts redundant; version 1 leaves cam-rec-2 with single points.
    expect(within(list).getByTestId('design-1-latest')).toHaveTextContent(/Version 2.*6 of 6 hosts redundant · no errors/);
    const flawed = FLAWED.latestVersion!.summary;
    expect(within(list).getByTestId('design-2-latest')).toHaveTextContent(
      new RegExp(`${flawed.redundantHosts} of 6 hosts redundant · ${flawed.errors} errors · ${flawed.singlePointsOfFailure} single points of failure`),
    );
    expect(within(list).getByTestId('design-3-latest')).toHaveTextContent('No versions yet');
    expect(screen.queryByTestId('designs-table')).toBeNull();
  });

  it('says both when a draft follows an approved version: “Approved v3 · draft v4”, on a phone and in the table', async () => {
    const base = listItem(4, 'Harbor Road storage', 'approved', 4);
    const next: DesignListItem = { ...base, latestVersion: { ...base.latestVersion!, review: 'draft' }, approvedVersion: { number: 3, approvedAt: '2026-11-27T10:00:00.000Z' } };
    serve([next, HARBOR]);
    renderList(people.designer);
    const list = await screen.findByTestId('designs-list');
    expect(within(list).getByTestId('design-4-status')).toHaveTextContent('Approved v3·draft v4');
    expect(within(list).getByTestId('design-4-status').props['aria-label']).toBe('Approved v3 · draft v4');
    // The approved version that is also the latest says so once.
    expect(within(list).getByTestId('design-1-status').props['aria-label']).toBe('Approved v2');
    screen.unmount();
    renderList(people.designer, 1440);
    const table = await screen.findByTestId('designs-table');
    expect(within(table).getByTestId('design-4-status').props['aria-label']).toBe('Approved v3 · draft v4');
  });

  it('uses a table on a wide screen', async () => {
    serve([HARBOR]);
    renderList(people.reviewer, 1440);
    expect(await screen.findByTestId('designs-table')).toHaveTextContent(/Harbor Road storage/);
    expect(screen.queryByTestId('designs-list')).toBeNull();
  });

  it('offers New design to designers and not to reviewers or installers', async () => {
    serve([HARBOR]);
    const { unmount } = renderList(people.designer);
    expect(await screen.findByTestId('designs-new')).toBeOnTheScreen();
    unmount();
    for (const user of [people.reviewer, people.installer]) {
      const view = renderList(user);
      await screen.findByTestId('designs-list');
      expect(screen.queryByTestId('designs-new')).toBeNull();
      view.unmount();
    }
  });

  it('searches on the server by name and shows what matched', async () => {
    serve([HARBOR, FLAWED]);
    renderList(people.designer);
    await screen.findByTestId('design-2');
    fireEvent.changeText(screen.getByTestId('designs-search'), 'annex');
    await waitFor(() => expect(get).toHaveBeenCalledWith('/api/designs?q=annex'));
    await waitFor(() => expect(screen.queryByTestId('design-1')).toBeNull());
    expect(screen.getByTestId('designs-count')).toHaveTextContent('1 matching “annex”');
  });

  it('counts every design, shows the first page, and loads the next page on request', async () => {
    get.mockImplementation(async (path: string) => {
      if (path === '/api/team') return { team: { id: 1, name: 'Tidewater Cold Storage' }, members: [], invitations: [] };
      if (path === '/api/designs') return { designs: [HARBOR, FLAWED], nextCursor: '1764650000000.2', total: 3 };
      if (path === '/api/designs?cursor=1764650000000.2') return { designs: [EMPTY], nextCursor: null, total: 3 };
      throw new Error(`unexpected request ${path}`);
    });
    renderList(people.designer);
    await screen.findByTestId('design-2');
    expect(screen.getByTestId('designs-count')).toHaveTextContent('3 designs, 2 shown');
    expect(screen.queryByTestId('design-3')).toBeNull();
    fireEvent.press(screen.getByTestId('designs-more'));
    expect(await screen.findByTestId('design-3')).toBeOnTheScreen();
    expect(screen.getByTestId('designs-count')).toHaveTextContent(/^3 designs$/);
    expect(screen.queryByTestId('designs-more')).toBeNull();
  });

  it('invites a designer to start the first design when the team has none', async () => {
    serve([]);
    renderList(people.designer);
    expect(await screen.findByTestId('designs-empty')).toHaveTextContent(/No designs yet/);
    expect(screen.getByTestId('designs-empty-new')).toBeOnTheScreen();
  });

  it('tells an installer that nothing is approved yet rather than offering to start one', async () => {
    serve([]);
    renderList(people.installer);
    expect(await screen.findByTestId('designs-empty')).toHaveTextContent(/Nothing approved to build yet/);
    expect(screen.queryByTestId('designs-empty-new')).toBeNull();
  });
});
