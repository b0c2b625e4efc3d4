import { act, render, screen } from '@testing-library/react-native';
import { canvasUiStore } from '@/lib/editor/canvas-ui';
import { runCommand } from '@/lib/editor/commands';
import { buildSnapshot } from '@/lib/editor/geometry';
import { analyseNow, liveAnalysisStore } from '@/lib/editor/live-analysis';
import { editorStore } from '@/lib/editor/store';
import { CanvasScene } from '@/components/canvas/CanvasScene';
import type { Topology } from '@/shared/topology/schema';
import { TOPOLOGY_FORMAT } from '@/shared/topology/schema';

// Count renders of the two leaf components the drag must leave alone or touch.
jest.mock('@/components/canvas/PortGlyph', () => {
  const actual = jest.requireActual('@/components/canvas/PortGlyph');
  const { memo } = jest.requireActual('react');
  const counts = { renders: 0 };
  const Inner = actual.PortGlyph.type;
  return { PortGlyph: memo((props: object) => { counts.renders += 1; return Inner(props); }), counts };
});
jest.mock('@/components/canvas/CableView', () => {
  const actual = jest.requireActual('@/components/canvas/CableView');
  const { memo } = jest.requireActual('react');
  const counts = { renders: 0 };
  const Inner = actual.CableView.type;
  return { CableView: memo((props: object) => { counts.renders += 1; return Inner(props); }), counts };
});
const ports = jest.requireMock('@/components/canvas/PortGlyph').counts as { renders: number };
const cables = jest.requireMock('@/components/canvas/CableView').counts as { renders: number };

/** host-1 == switch-1 == array-1 ctl-a, ctl-b; host-2 on nothing: host-1 has a single path. */
function design(): Topology {
  let doc: Topology = { format: TOPOLOGY_FORMAT, name: 'scene test', devices: [], cables: [], networks: [] };
  doc = runCommand(doc, 'addDevice', { template: 'array', options: { dataPorts: 2 }, position: { x: 0, y: 600 } });
  doc = runCommand(doc, 'addDevice', { template: 'data-switch', options: { ports: 12 }, position: { x: 0, y: 300 } });
  doc = runCommand(doc, 'addDevice', { template: 'host', position: { x: 0, y: 0 } });
  doc = runCommand(doc, 'addDevice', { template: 'host', position: { x: 400, y: 0 } });
  for (const [a, b] of [['switch-1-p1', 'array-1-ctl-a-p1'], ['switch-1-p2', 'array-1-ctl-b-p1'], ['host-1-card-1-p1', 'switch-1-p3']]) doc = runCommand(doc, 'cablePorts', { a, b });
  return doc;
}

beforeEach(() => {
  editorStore.getState().load(design(), { designId: 1, baseVersion: 1 });
  canvasUiStore.setState({ drag: null, marquee: null, pointer: null, chooser: null, cableTags: 'fabric' });
  analyseNow(liveAnalysisStore, editorStore.getState().doc);
});

describe('the canvas scene', () => {
  it('draws every device, port and cable of the snapshot with test ids', () => {
    render(<CanvasScene width={800} height={600} label="Diagram" />);
    const doc = editorStore.getState().doc;
    for (const d of doc.devices) expect(screen.getByTestId(`device-${d.id}`)).toBeTruthy();
    for (const c of doc.cables) expect(screen.getByTestId(`cable-${c.id}`)).toBeTruthy();
    expect(screen.getByTestId('port-host-1-card-1-p1')).toBeTruthy();
  });

  it('marks the single points of failure of host-1 and badges it as not redundant', () => {
    render(<CanvasScene width={800} height={600} label="Diagram" />);
    // One switch, one card, one cable: each alone cuts host-1 off.
    expect(screen.getByTestId('spof-mark-switch-1')).toBeTruthy();
    expect(screen.getByTestId('spof-mark-host-1-card-1')).toBeTruthy();
    expect(screen.getByTestId('spof-mark-cable-3')).toBeTruthy();
    // The spoken label sits on the svg group element (the native host drops it).
    const label = (id: string) => String(screen.UNSAFE_getByProps({ testID: id }).props['aria-label']);
    expect(label('host-badge-host-1')).toMatch(/2 sessions .* not redundant/);
    expect(label('host-badge-host-2')).toMatch(/reaches no storage array/);
  });

  it('re-renders no port and only the moved device’s cables while a drag preview moves', () => {
    render(<CanvasScene width={800} height={600} label="Diagram" />);
    const from = buildSnapshot(editorStore.getState().doc).devices.get('switch-1')!.position;
    const [portsBefore, cablesBefore] = [ports.renders, cables.renders];
    for (let i = 1; i <= 5; i += 1) {
      act(() => canvasUiStore.setState({ drag: { ids: ['switch-1'], from: { 'switch-1': from }, moves: { 'switch-1': { x: from.x + 20 * i, y: from.y } } } }));
    }
    // switch-1 holds all three cables; nothing inside any device is drawn again.
    expect([ports.renders - portsBefore, cables.renders - cablesBefore]).toEqual([0, 15]);
    expect(screen.UNSAFE_getByProps({ testID: 'device-switch-1' }).props.transform).toBe(`translate(${from.x + 100} ${from.y})`);
    // The document is untouched until the pointer lifts.
    expect(editorStore.getState().doc.layout!['switch-1']).toEqual(from);
  });

  it('draws the selection without redrawing unselected devices’ ports', () => {
    render(<CanvasScene width={800} height={600} label="Diagram" />);
    const before = ports.renders;
    act(() => editorStore.getState().select(['host-2-card-1-p1']));
    // Only the newly selected port of host-2 redraws.
    expect(ports.renders - before).toBe(1);
  });

  it('tells Category 6 from 6A by the words in the cable tag, and shows the printed label when asked', () => {
    act(() => {
      editorStore.getState().run('setCable', { id: 'cable-1', media: 'cat6' });
      editorStore.getState().run('setCable', { id: 'cable-2', media: 'cat6a', label: 'HR-A-07' });
    });
    render(<CanvasScene width={800} height={600} label="Diagram" />);
    const tagText = (id: string) => String(screen.UNSAFE_getByProps({ testID: `cable-tag-${id}` }).props['aria-label']);
    // Not by colour or width alone: the tag names the category (TIA-568 Category 6 and 6A).
    expect(tagText('cable-1')).toMatch(/^tag (. · )?6$/);
    expect(tagText('cable-2')).toMatch(/^tag (. · )?6A$/);
    act(() => canvasUiStore.setState({ cableTags: 'label' }));
    expect(tagText('cable-2')).toBe('tag HR-A-07');
    expect(tagText('cable-1')).toMatch(/^tag C\d+$/);
  });
});
