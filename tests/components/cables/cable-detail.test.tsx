import { screen, within } from '@testing-library/react-native';
import { CableDetailScreen } from '@/components/cables/CableDetailScreen';
import { api } from '@/lib/api/client';
import { cableSchedule } from '@/shared/schedule';
import { designResponse, docs, versionDetail, versionSummary } from '../designs/helpers';
import { renderWithClient } from '../helpers/render';

jest.mock('@/lib/api/client', () => require('../helpers/mock-client').clientModule());
jest.mock('expo-router', () => ({ Link: ({ children }: { children: React.ReactNode }) => children }));
const get = api.get as jest.Mock;

/** Harbor Road version 2 as the server answers it: the shared schedule of the demo document. */
function serve() {
  const schedule = cableSchedule(docs.v2);
  get.mockImplementation(async (path: string) => {
    if (path === '/api/designs/1') return designResponse([versionSummary({ number: 2, doc: docs.v2 })]);
    if (path === '/api/designs/1/versions/2') return { version: versionDetail({ number: 2, doc: docs.v2, state: 'approved' }) };
    if (path === '/api/designs/1/versions/2/cables') return schedule;
    throw new Error(`unexpected request ${path}`);
  });
  return schedule;
}

beforeEach(() => get.mockReset());

describe('cable detail', () => {
  it('shows both ends of an array cable: device, controller, port, rack and unit', async () => {
    const schedule = serve();
    // A cable from a switch to an array controller, both placed (the demo has racks A01 and A02).
    const row = schedule.cables.find((c) => c.b.part !== null && c.a.rack !== null && c.b.rack !== null && c.a.part === null)!;
    expect(row).toBeDefined();
    renderWithClient(<CableDetailScreen id={1} n={2} cableId={row.id} />);
    expect(await screen.findByTestId('cable-detail-label')).toHaveTextContent(row.label);
    expect(screen.getByTestId('cable-detail-identifier')).toHaveTextContent(row.identifier);
    const near = screen.getByTestId('cable-detail-a');
    expect(within(near).getByTestId('cable-detail-a-device')).toHaveTextContent(row.a.device);
    expect(within(near).getByTestId('cable-detail-a-port')).toHaveTextContent(row.a.port);
    expect(within(near).getByTestId('cable-detail-a-rack')).toHaveTextContent(row.a.rack!);
    expect(within(near).getByTestId('cable-detail-a-ru')).toHaveTextContent(String(row.a.ru));
    expect(within(near).queryByTestId('cable-detail-a-part')).toBeNull();
    const far = screen.getByTestId('cable-detail-b');
    expect(within(far).getByTestId('cable-detail-b-device')).toHaveTextContent(row.b.device);
    expect(within(far).getByTestId('cable-detail-b-part')).toHaveTextContent(row.b.part!);
    // The array's part is a controller (docs/topology-format.md: arrays hold controllers, hosts cards).
    expect(await within(far).findByText('Controller')).toBeOnTheScreen();
    expect(within(far).getByTestId('cable-detail-b-port')).toHaveTextContent(row.b.port);
    expect(within(far).getByTestId('cable-detail-b-rack')).toHaveTextContent(row.b.rack!);
  });

  it('gives media, chosen, estimated and stock length and the network with its VLAN', async () => {
    const schedule = serve();
    const row = schedule.cables.find((c) => c.vlan !== null && c.estimatedLengthM !== null)!;
    renderWithClient(<CableDetailScreen id={1} n={2} cableId={row.id} />);
    await screen.findByTestId('cable-detail-facts');
    // The demo's fabric cables are Category 6A (docs/demo.md); ANSI/TIA-568.2-D's name for the media.
    expect(row.media).toBe('cat6a');
    expect(screen.getByTestId('cable-detail-media')).toHaveTextContent('Category 6A');
    expect(screen.getByTestId('cable-detail-length')).toHaveTextContent(row.lengthM === null ? 'length not set' : `${row.lengthM} m`);
    expect(screen.getByTestId('cable-detail-estimate')).toHaveTextContent(`${row.estimatedLengthM} m`);
    expect(screen.getByTestId('cable-detail-stock')).toHaveTextContent(`${row.stockLengthM} m`);
    expect(screen.getByTestId('cable-detail-network')).toHaveTextContent(`${row.network}, VLAN ${row.vlan}`);
  });

  it('draws the two devices with exactly one port marked on each, and keeps the build region', async () => {
    const schedule = serve();
    const row = schedule.cables[0];
    renderWithClient(
      <CableDetailScreen id={1} n={2} cableId={row.id}>
        <></>
      </CableDetailScreen>,
    );
    const drawing = await screen.findByTestId('cable-drawing');
    expect(drawing.props.accessibilityLabel).toBe(`Drawing: ${row.a.device} port ${row.a.port} cabled to ${row.b.device} port ${row.b.port}`);
    expect(screen.getAllByTestId('cable-drawing-near-lit')).toHaveLength(1);
    expect(screen.getAllByTestId('cable-drawing-far-lit')).toHaveLength(1);
    expect(screen.getByTestId('cable-detail-build')).toBeOnTheScreen();
  });

  it('says so when the cable is not in the version', async () => {
    serve();
    renderWithClient(<CableDetailScreen id={1} n={2} cableId="__proto__" />);
    expect(await screen.findByTestId('cable-detail-missing')).toHaveTextContent(/no cable with the id __proto__/);
  });
});
