import { act, fireEvent, render, screen } from '@testing-library/react-native';
import { harborRoadV2 } from '@/shared/fixtures/harbor-road';
import { describeId } from '@/lib/editor/describe';
import { analyseNow, liveAnalysisStore } from '@/lib/editor/live-analysis';
import { editorStore } from '@/lib/editor/store';
import { Inspector } from '@/components/inspector/Inspector';

function open(readOnly = false) {
  editorStore.getState().load(harborRoadV2(), { designId: 1, baseVersion: 2, readOnly });
  analyseNow(liveAnalysisStore, editorStore.getState().doc);
}

const doc = () => editorStore.getState().doc;
const device = (id: string) => doc().devices.find((d) => d.id === id)!;

describe('the inspector', () => {
  it('renames the selected host on Enter as one undo step, and follows the undo', () => {
    open();
    act(() => editorStore.getState().select(['wms-db-1']));
    render(<Inspector />);
    fireEvent.changeText(screen.getByTestId('inspector-name'), 'wms-db-primary');
    fireEvent(screen.getByTestId('inspector-name'), 'submitEditing');
    expect(device('wms-db-1').name).toBe('wms-db-primary');
    act(() => editorStore.getState().undo());
    expect(device('wms-db-1').name).toBe('wms-db-1');
    expect(screen.getByTestId('inspector-name').props.value).toBe('wms-db-1');
  });

  it('keeps an initiator name that breaks the iSCSI rules, and names every wrong character, as typed and as a finding', () => {
    open();
    act(() => editorStore.getState().select(['cam-rec-1']));
    render(<Inspector />);
    // RFC 7143 §4.2.7.4: the date is YYYY-MM with a month 01–12; explained while it is typed.
    fireEvent.changeText(screen.getByTestId('inspector-iqn'), 'iqn.2026-13.example.tidewater:cam-rec-1');
    expect(screen.getByTestId('inspector-iqn-error')).toHaveTextContent('Not a valid iSCSI name: the month "13" is not 01–12.');
    // RFC 3722 §6: "_" and spaces are prohibited; the name is kept all the same, as a draft may be.
    const bad = 'iqn.2026-01.example.tidewater:cam rec_1';
    fireEvent.changeText(screen.getByTestId('inspector-iqn'), bad);
    fireEvent(screen.getByTestId('inspector-iqn'), 'blur');
    expect(device('cam-rec-1')).toMatchObject({ iqn: bad });
    act(() => analyseNow(liveAnalysisStore, editorStore.getState().doc));
    const finding = liveAnalysisStore.getState().report!.findings.find((f) => f.rule === 'iqn-invalid' && f.subjects.includes('cam-rec-1'))!;
    expect(finding.message).toContain('a space and "_"');
    expect(screen.getByTestId('inspector-iqn-error')).toHaveTextContent(finding.message);
  });

  it('edits the array’s target name, suggests one from the hosts’ prefix, and lets a controller carry its own', () => {
    open();
    act(() => editorStore.getState().select(['vault-1']));
    render(<Inspector />);
    expect(screen.getByTestId('inspector-target-iqn').props.value).toBe('iqn.2026-01.example.tidewater:storage.vault-1');
    // RFC 7143 §4.2.7.4: target names follow the same iqn rules as initiator names.
    fireEvent.changeText(screen.getByTestId('inspector-target-iqn'), 'iqn.2026-13.example.tidewater:vault');
    expect(screen.getByTestId('inspector-target-iqn-error')).toHaveTextContent('Not a valid iSCSI name: the month "13" is not 01–12.');
    fireEvent.changeText(screen.getByTestId('inspector-target-iqn'), '');
    fireEvent(screen.getByTestId('inspector-target-iqn'), 'blur');
    expect(device('vault-1')).not.toHaveProperty('iqn');
    fireEvent.press(screen.getByTestId('inspector-target-iqn-suggest'));
    expect(device('vault-1')).toMatchObject({ iqn: 'iqn.2026-01.example.tidewater:storage.vault-1' });

    act(() => editorStore.getState().select(['vault-1.ctl-b']));
    fireEvent.changeText(screen.getByTestId('inspector-controller-iqn'), 'iqn.2026-01.example.tidewater:storage.vault-1.ctl-b');
    fireEvent(screen.getByTestId('inspector-controller-iqn'), 'submitEditing');
    const ctl = () => (device('vault-1') as { controllers: { id: string; iqn?: string }[] }).controllers.find((c) => c.id === 'vault-1.ctl-b')!;
    expect(ctl().iqn).toBe('iqn.2026-01.example.tidewater:storage.vault-1.ctl-b');
    act(() => editorStore.getState().undo());
    expect(ctl()).not.toHaveProperty('iqn');
  });

  it('sets the CHAP mode of the design and says the secrets are not stored, with the RFC’s lengths', () => {
    open();
    render(<Inspector />);
    // RFC 7143 §9.2.1: under 96 bits (12 bytes) needs IPsec; RFC 1994 §2.3 prefers 16 octets.
    expect(screen.getByTestId('inspector-chap-note')).toHaveTextContent(/never a secret.*at least 12 bytes \(RFC 7143 §9\.2\.1.*16 random bytes/);
    fireEvent.press(screen.getByTestId('inspector-chap-one-way'));
    expect(doc().security?.chap).toBe('one-way');
  });

  it('puts a port on a network and gives it the next free address with Static', () => {
    open();
    act(() => editorStore.getState().run('setPort', { id: 'wms-db-1.card-1.p2', networkId: null, address: null }));
    act(() => editorStore.getState().select(['wms-db-1.card-1.p2']));
    render(<Inspector />);
    const network = doc().networks.find((n) => n.name === 'fabric A')!;
    fireEvent.press(screen.getByTestId(`port-network-wms-db-1.card-1.p2-${network.id}`));
    fireEvent.press(screen.getByTestId('port-address-mode-wms-db-1.card-1.p2-static'));
    const found = describeId(doc(), 'wms-db-1.card-1.p2');
    const port = found?.kind === 'port' ? found.port : null;
    expect(port?.networkId).toBe(network.id);
    // Inside fabric A's 198.51.100.0/24 (RFC 5737), not the network address.
    expect(port?.address).toMatchObject({ mode: 'static', ip: expect.stringMatching(/^198\.51\.100\.(?!0$)\d+$/) });
  });

  it('offers no edits in read-only mode', () => {
    open(true);
    act(() => editorStore.getState().select(['fab-a']));
    render(<Inspector />);
    expect(screen.getByTestId('inspector-name').props.editable).toBe(false);
    expect(screen.queryByTestId('inspector-delete')).toBeNull();
    expect(screen.queryByTestId('inspector-add-port')).toBeNull();
  });
});
