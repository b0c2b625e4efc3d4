import { act, fireEvent, render, screen } from '@testing-library/react-native';
import { harborRoadV2 } from '@/shared/fixtures/harbor-road';
import { analyseNow, liveAnalysisStore } from '@/lib/editor/live-analysis';
import { editorStore } from '@/lib/editor/store';
import { NetworksScreen } from '@/components/networks/NetworksScreen';

const doc = () => editorStore.getState().doc;

beforeEach(() => {
  editorStore.getState().load(harborRoadV2(), { designId: 1, baseVersion: 2 });
  analyseNow(liveAnalysisStore, doc());
});

describe('networks and addresses', () => {
  it('refuses a network without a prefix length under the field, and adds a valid one', () => {
    render(<NetworksScreen wide />);
    fireEvent.changeText(screen.getByTestId('add-network-name'), 'fabric C');
    fireEvent.changeText(screen.getByTestId('add-network-cidr'), '198.51.100.128');
    fireEvent.press(screen.getByTestId('add-network-submit'));
    expect(screen.getByTestId('add-network-cidr-error')).toHaveTextContent(/prefix length/);
    expect(doc().networks).toHaveLength(3);
    // A documentation block (RFC 3849) so it overlaps nothing of the demo's.
    fireEvent.changeText(screen.getByTestId('add-network-cidr'), '2001:db8:c::/64');
    fireEvent.changeText(screen.getByTestId('add-network-vlan'), '130');
    fireEvent.press(screen.getByTestId('add-network-submit'));
    expect(doc().networks.map((n) => [n.name, n.cidr, n.vlan])).toContainEqual(['fabric C', '2001:db8:c::/64', 130]);
  });

  it('never says OK beside an address that is in error while it is typed', () => {
    render(<NetworksScreen wide />);
    const port = 'wms-db-1.card-1.p1';
    expect(screen.getByTestId(`address-status-${port}`)).toHaveTextContent('OK');
    fireEvent.changeText(screen.getByTestId(`address-ip-${port}`), '198.51.100.x');
    expect(screen.getByTestId(`address-status-${port}`)).not.toHaveTextContent(/OK/);
    expect(screen.getByTestId(`address-status-${port}`)).toHaveTextContent('Not saved: fix the address first');
    fireEvent.changeText(screen.getByTestId(`address-ip-${port}`), '198.51.100.21');
    expect(screen.getByTestId(`address-status-${port}`)).toHaveTextContent('OK');
  });

  it('saves a VLAN outside 1–4094 and shows the analysis’s finding under the field', () => {
    render(<NetworksScreen wide />);
    const id = doc().networks[0].id;
    // IEEE 802.1Q: 0 and 4095 are reserved, so 4095 is a finding.
    fireEvent.changeText(screen.getByTestId(`network-${id}-vlan`), '4095');
    fireEvent(screen.getByTestId(`network-${id}-vlan`), 'blur');
    expect(doc().networks[0].vlan).toBe(4095);
    act(() => analyseNow(liveAnalysisStore, doc()));
    expect(screen.getByTestId(`network-${id}-vlan-error`)).toHaveTextContent(/4095/);
  });

  it("puts a port's address outside the network on the port, not under the network's gateway", () => {
    const port = 'wms-db-1.card-1.p1';
    const network = doc().networks.find((n) => n.id === harborRoadV2().devices.flatMap((d) => (d.kind === 'host' ? d.adapters.flatMap((a) => a.ports) : [])).find((p) => p.id === port)!.networkId)!;
    // An address of fabric B's block (RFC 5737 TEST-NET-3, 203.0.113.0/24) on a fabric A port (198.51.100.0/24).
    act(() => {
      editorStore.getState().run('setPort', { id: port, address: { mode: 'static', ip: '203.0.113.9' } });
      analyseNow(liveAnalysisStore, doc());
    });
    render(<NetworksScreen wide />);
    expect(liveAnalysisStore.getState().report!.findings.some((f) => f.rule === 'address-outside-network' && f.subjects.includes(network.id))).toBe(true);
    expect(screen.queryByTestId(`network-${network.id}-gateway-error`)).toBeNull();
    expect(screen.getByTestId(`network-${network.id}`)).toHaveTextContent(/203\.0\.113\.9, which is outside/);
  });

  it("shows a gateway outside the network's block under the gateway field", () => {
    const id = doc().networks[0].id;
    render(<NetworksScreen wide />);
    // fabric A is 198.51.100.0/24 (RFC 5737 TEST-NET-2); 203.0.113.254 lies in TEST-NET-3, outside it.
    fireEvent.changeText(screen.getByTestId(`network-${id}-gateway`), '203.0.113.254');
    fireEvent(screen.getByTestId(`network-${id}-gateway`), 'blur');
    act(() => analyseNow(liveAnalysisStore, doc()));
    expect(screen.getByTestId(`network-${id}-gateway-error`)).toHaveTextContent(/gateway 203\.0\.113\.254 of fabric A is outside 198\.51\.100\.0\/24/);
  });

  it('flags a duplicate address in the table with words and an icon, from the report', () => {
    const [a, b] = ['wms-db-1.card-1.p1', 'wms-db-2.card-1.p1'];
    const ip = '198.51.100.5';
    act(() => {
      editorStore.getState().run('setPort', { id: b, address: { mode: 'static', ip } });
      analyseNow(liveAnalysisStore, doc());
    });
    render(<NetworksScreen wide />);
    fireEvent.press(screen.getByTestId('address-filter-problems'));
    expect(screen.getByTestId(`address-status-${a}`)).toHaveTextContent(new RegExp(`Duplicate: ${ip.replace(/\./g, '\\.')} is used by`));
    expect(screen.getByTestId(`address-status-${b}`)).toHaveTextContent(/Duplicate/);
  });

  it('auto-assigns the ports that are on a network and have no address', () => {
    act(() => {
      editorStore.getState().run('clearAddresses', {});
    });
    render(<NetworksScreen wide />);
    fireEvent.press(screen.getByTestId('networks-assign-all'));
    const addressed = doc().devices.flatMap((d) => (d.kind === 'switch' ? [] : (d.kind === 'array' ? d.controllers : d.adapters).flatMap((g) => g.ports))).filter((p) => p.networkId);
    expect(addressed.every((p) => p.address?.mode === 'static')).toBe(true);
    expect(editorStore.temporal.getState().pastStates).toHaveLength(2);
  });
});
