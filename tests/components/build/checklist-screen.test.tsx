import { fireEvent, screen } from '@testing-library/react-native';
import { ChecklistScreen } from '@/components/build/ChecklistScreen';
import { api } from '@/lib/api/client';
import { buildQueue } from '@/lib/api/build';
import { analyze } from '@/shared/analysis/analyze';
import { bringUpSteps } from '@/shared/build/steps';
import { emptyRecord } from '@/shared/keys/record';
import { designResponse, docs, versionSummary } from '../designs/helpers';
import { demoUsers, renderWithClient } from '../helpers/render';
import { buildRecord } from './fixtures';

jest.mock('@/lib/api/client', () => require('../helpers/mock-client').clientModule());
jest.mock('expo-router', () => ({ Link: ({ children }: { children: React.ReactNode }) => children }));
const get = api.get as jest.Mock;

const report = analyze(docs.v2);
const steps = bringUpSteps(docs.v2, report);

beforeEach(() => {
  buildQueue.setState({ items: [] });
  const record = buildRecord((r) => {
    r.steps = emptyRecord();
    for (const step of steps) r.steps[step.id] = { done: false, note: null, by: null, at: null };
    r.progress = { ...r.progress, steps: { done: 0, total: steps.length } };
  });
  get.mockReset();
  get.mockImplementation(async (path: string) => {
    if (path === '/api/designs/1/versions/2/build') return { build: record };
    if (path === '/api/designs/1/versions/2/build/checklist') return { checklist: steps };
    if (path === '/api/designs/1') return designResponse([versionSummary({ number: 2, doc: docs.v2 })]);
    throw new Error(`unexpected request ${path}`);
  });
});

describe('bring-up checklist screen', () => {
  it('opens with the safety briefing, deferring to local codes and licensed practice', async () => {
    renderWithClient(<ChecklistScreen id={1} n={2} />, { user: demoUsers.installer });
    const first = await screen.findByTestId('step-safety-0');
    expect(first).toHaveTextContent(/Safety briefing/);
    expect(first).toHaveTextContent(/local electrical and building codes/);
    expect(first).toHaveTextContent(/licensed practice/);
    expect(screen.getByTestId('phase-safety')).toHaveTextContent(/licensed practice come first/);
  });

  it('ticks a step with a note through the phone\u2019s queue and shows it waiting to send', async () => {
    renderWithClient(<ChecklistScreen id={1} n={2} />, { user: demoUsers.installer });
    await screen.findByTestId('step-safety-0');
    fireEvent.press(screen.getByTestId('step-safety-0-done'));
    expect(buildQueue.getState().items.map((i) => i.fields)).toEqual([{ stepId: steps[0].id, done: true }]);
    expect(screen.getByTestId('step-safety-0-by')).toHaveTextContent(/Ines Duarte.*waiting to send/);
    fireEvent.press(screen.getByTestId('step-safety-0-note-open'));
    fireEvent.changeText(screen.getByTestId('step-safety-0-note'), 'Briefed the crew of three');
    fireEvent.press(screen.getByTestId('step-safety-0-note-save'));
    expect(buildQueue.getState().items.map((i) => i.fields)[1]).toEqual({ stepId: steps[0].id, done: true, note: 'Briefed the crew of three' });
    expect(screen.getByText('Note: Briefed the crew of three')).toBeOnTheScreen();
  });

  it('gives a reviewer the checklist to read, without ticks to set', async () => {
    renderWithClient(<ChecklistScreen id={1} n={2} />, { user: { ...demoUsers.designer, role: 'reviewer' } });
    await screen.findByTestId('step-safety-0');
    expect(screen.getByTestId('checklist-read-only')).toHaveTextContent(/Installers and admins mark the build/);
    fireEvent.press(screen.getByTestId('step-safety-0-done'));
    expect(buildQueue.getState().items).toHaveLength(0);
  });

});
