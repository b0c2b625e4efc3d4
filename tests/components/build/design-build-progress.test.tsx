import { screen } from '@testing-library/react-native';
import { DesignBuildProgress } from '@/components/build/DesignBuildProgress';
import { api } from '@/lib/api/client';
import { demoUsers, renderWithClient } from '../helpers/render';
import { buildRecord, INES } from './fixtures';

jest.mock('@/lib/api/client', () => require('../helpers/mock-client').clientModule());
jest.mock('expo-router', () => ({ Link: ({ children }: { children: React.ReactNode }) => children }));
const get = api.get as jest.Mock;

describe('build progress on the design screen', () => {
  it('shows the team cables tested and steps done, in total and per rack', async () => {
    const record = buildRecord((r) => {
      r.cables.c1 = { state: 'tested', note: null, by: INES, at: '2026-12-01T09:00:00.000Z' };
      r.cables.c2 = { state: 'problem', note: 'bent pin', by: INES, at: '2026-12-01T09:10:00.000Z' };
      r.progress = {
        cables: { done: 1, total: 3 },
        steps: { done: 0, total: 1 },
        states: { 'not-started': 1, run: 0, tested: 1, problem: 1 },
        racks: [
          { rackId: 'a01', rack: 'A01', cables: { done: 1, total: 2 }, steps: { done: 0, total: 0 } },
          { rackId: null, rack: null, cables: { done: 0, total: 1 }, steps: { done: 0, total: 0 } },
        ],
      };
    });
    get.mockImplementation(async (path: string) => {
      if (path === '/api/designs/1/versions/2/build') return { build: record };
      throw new Error(`unexpected request ${path}`);
    });
    renderWithClient(<DesignBuildProgress designId={1} version={2} />, { user: demoUsers.designer });
    expect(await screen.findByTestId('design-build-progress-cables-text')).toHaveTextContent('1 of 3 tested');
    expect(screen.getByTestId('design-build-progress-steps-text')).toHaveTextContent('0 of 1 done');
    expect(screen.getByText('1 tested, 1 problem')).toBeOnTheScreen();
    expect(screen.getByTestId('design-build-progress-rack-0')).toHaveTextContent(/A01.*Cables 1 of 2 tested/);
    expect(screen.getByTestId('design-build-progress-rack-1')).toHaveTextContent(/Not in a rack.*Cables 0 of 1 tested/);
    expect(screen.queryByTestId('design-build-complete')).toBeNull();
  });

  it('says when the record was complete', async () => {
    const record = buildRecord((r) => {
      r.complete = true;
      r.completedAt = '2026-12-02T11:00:00.000Z';
    });
    get.mockResolvedValue({ build: record });
    renderWithClient(<DesignBuildProgress designId={1} version={2} />, { user: demoUsers.designer });
    expect(await screen.findByTestId('design-build-complete')).toHaveTextContent('Complete');
    expect(screen.getByText(/Every cable tested and every step done/)).toBeOnTheScreen();
  });
});
