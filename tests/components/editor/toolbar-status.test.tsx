import { act, screen } from '@testing-library/react-native';
import { renderWithClient } from '../helpers/render';
import { harborRoadV1, harborRoadV2 } from '@/shared/fixtures/harbor-road';
import { analyze } from '@/shared/analysis/analyze';
import { analyseNow, liveAnalysisStore } from '@/lib/editor/live-analysis';
import { editorStore } from '@/lib/editor/store';
import { EditorToolbar } from '@/components/editor/EditorToolbar';
import type { Topology } from '@/shared/topology/schema';

const noop = () => {};

function renderToolbar(doc: Topology, baseVersion: number, approvedVersion: number | null = null) {
  editorStore.getState().load(doc, { designId: 1, baseVersion });
  analyseNow(liveAnalysisStore, doc);
  renderWithClient(<EditorToolbar wide view="canvas" onView={noop} onBack={noop} onSave={noop} onHelp={noop} onAdd={noop} onFindings={noop} paletteOpen approvedVersion={approvedVersion} />);
}

describe('the editor status line', () => {
  it('counts problems and warnings with the same words as the findings list', () => {
    const doc = harborRoadV1();
    const findings = analyze(doc).findings;
    const errors = findings.filter((f) => f.severity === 'error').length;
    const warnings = findings.filter((f) => f.severity === 'warning').length;
    // docs/demo.md: version 1 has problems and warnings for the reviewer to find.
    expect(errors).toBeGreaterThan(0);
    expect(warnings).toBeGreaterThan(0);
    renderToolbar(doc, 1);
    expect(screen.getByTestId('editor-status')).toHaveTextContent(`Saved · version 1 · ${errors} problems, ${warnings} warnings`);
  });

  it('leaves warnings out when there are none, and follows the live analysis', () => {
    renderToolbar(harborRoadV2(), 2);
    expect(screen.getByTestId('editor-status')).toHaveTextContent(/^Saved · version 2 · 0 problems$/);
    // CHAP off is a warning (RFC 7143 §9.2: CHAP is how iSCSI authenticates initiator and target).
    act(() => {
      editorStore.getState().run('setChap', { chap: 'none' });
      analyseNow(liveAnalysisStore, editorStore.getState().doc);
    });
    expect(screen.getByTestId('editor-status')).toHaveTextContent(/0 problems, 1 warning$/);
  });

  it('says which version is approved when a newer one is open, and when the open one is it', () => {
    renderToolbar(harborRoadV2(), 4, 3);
    expect(screen.getByTestId('editor-status')).toHaveTextContent(/^Saved · version 4 · approved v3 · 0 problems$/);
    screen.unmount();
    renderToolbar(harborRoadV2(), 3, 3);
    expect(screen.getByTestId('editor-status')).toHaveTextContent(/^Saved · version 3, approved · 0 problems$/);
  });
});
