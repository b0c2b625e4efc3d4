import { act, fireEvent, render, screen } from '@testing-library/react-native';
import { harborRoadV1 } from '@/shared/fixtures/harbor-road';
import { canvasUiStore } from '@/lib/editor/canvas-ui';
import { analyseNow, liveAnalysisStore } from '@/lib/editor/live-analysis';
import { editorStore } from '@/lib/editor/store';
import { withTidyLayout } from '@/lib/editor/tidy';
import { CableChooser } from '@/components/editor/CableChooser';
import { FindingsPanel } from '@/components/editor/FindingsPanel';

beforeEach(() => {
  editorStore.getState().load(withTidyLayout(harborRoadV1()).doc, { designId: 1, baseVersion: 1 });
  canvasUiStore.setState({ screen: { width: 900, height: 700 }, chooser: null });
  analyseNow(liveAnalysisStore, editorStore.getState().doc);
});

describe('the findings list', () => {
  it('lists version 1’s problems first and, on a tap, selects a finding’s subjects and moves the view to them', () => {
    render(<FindingsPanel />);
    expect(screen.getByTestId('findings-status')).toHaveTextContent(/^\d+ problems?, \d+ warnings?, \d+ notes?$/);
    const viewport = editorStore.getState().viewport;
    fireEvent.press(screen.getByTestId('finding-single-point-of-failure-0'));
    const finding = liveAnalysisStore.getState().report!.findings.find((f) => f.rule === 'single-point-of-failure')!;
    expect(editorStore.getState().selection).toEqual(finding.subjects);
    expect(editorStore.getState().viewport).not.toEqual(viewport);
  });

  it('filters by severity', () => {
    render(<FindingsPanel />);
    fireEvent.press(screen.getByTestId('findings-filter-warning'));
    expect(screen.queryByTestId('finding-single-point-of-failure-0')).toBeNull();
    expect(screen.getByTestId('finding-chap-off-0')).toBeTruthy();
  });
});

describe('the cable chooser', () => {
  it('starts from the media remembered for the connector, cables the two ports and remembers the new choice', () => {
    const state = editorStore.getState();
    act(() => {
      state.setCableDefaults('rj45', { media: 'cat6', lengthM: 5 });
      state.startCable('cam-rec-2.card-2.p1');
      canvasUiStore.setState({ chooser: { a: 'cam-rec-2.card-2.p1', b: 'fab-b.p11' } });
    });
    render(<CableChooser wide />);
    expect(screen.getByTestId('cable-chooser-ends')).toHaveTextContent('cam-rec-2 card-2 p1 → fab-b p11');
    expect(screen.getByTestId('cable-chooser-length').props.value).toBe('5');
    // Category 6A carries 10GBASE-T over 100 m (IEEE 802.3an): the suggestion for 10G RJ45.
    expect(screen.getByText(/Suggested for these ports: Cat 6A copper/)).toBeTruthy();
    fireEvent.press(screen.getByTestId('cable-chooser-media-cat6a'));
    fireEvent.changeText(screen.getByTestId('cable-chooser-length'), '4');
    fireEvent.press(screen.getByTestId('cable-chooser-confirm'));
    const cable = editorStore.getState().doc.cables.find((c) => c.a === 'cam-rec-2.card-2.p1');
    expect(cable).toMatchObject({ b: 'fab-b.p11', media: 'cat6a', lengthM: 4 });
    expect(editorStore.getState().cableDefaults.rj45).toEqual({ media: 'cat6a', lengthM: 4 });
    expect(canvasUiStore.getState().chooser).toBeNull();
  });
});
