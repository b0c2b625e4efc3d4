import { fireEvent, screen, within } from '@testing-library/react-native';
import { ScheduleScreen } from '@/components/cables/ScheduleScreen';
import { api } from '@/lib/api/client';
import { cableSchedule, naturalCompare, type CableSchedule, type ScheduleRow } from '@/shared/schedule';
import { designResponse, docs, versionSummary } from '../designs/helpers';
import { renderWithClient } from '../helpers/render';

jest.mock('@/lib/api/client', () => require('../helpers/mock-client').clientModule());
const mockPush = jest.fn();
jest.mock('expo-router', () => ({ Link: ({ children }: { children: React.ReactNode }) => children, useRouter: () => ({ push: mockPush }) }));
jest.mock('react-native/Libraries/Utilities/useWindowDimensions', () => ({ __esModule: true, default: jest.fn() }));
const dimensions: jest.Mock = jest.requireMock('react-native/Libraries/Utilities/useWindowDimensions').default;
const get = api.get as jest.Mock;

const phone = { width: 390, height: 844, scale: 2, fontScale: 1 };
const desk = { width: 1440, height: 900, scale: 1, fontScale: 1 };

function serve(schedule: CableSchedule = cableSchedule(docs.v2)) {
  get.mockImplementation(async (path: string) => {
    if (path === '/api/designs/1') return designResponse([versionSummary({ number: 2, doc: docs.v2 })]);
    if (path === '/api/designs/1/versions/2/cables') return schedule;
    throw new Error(`unexpected request ${path}`);
  });
  return schedule;
}

const touches = (row: ScheduleRow, device: string) => row.a.device === device || row.b.device === device;

beforeEach(() => {
  get.mockReset();
  mockPush.mockReset();
  dimensions.mockReturnValue(phone);
});

describe('schedule on a phone', () => {
  it('finds a cable by its label with the search box and nothing else', async () => {
    const schedule = serve();
    renderWithClient(<ScheduleScreen id={1} n={2} />);
    const search = await screen.findByTestId('schedule-search');
    expect(screen.getByTestId('schedule-count')).toHaveTextContent(`${schedule.cables.length} cables`);
    const wanted = schedule.cables[schedule.cables.length - 1];
    fireEvent.changeText(search, wanted.label.toLowerCase());
    expect(await screen.findByTestId(`schedule-card-${wanted.id}`)).toBeOnTheScreen();
    const others = schedule.cables.filter((c) => c.id !== wanted.id && c.label.toLowerCase().includes(wanted.label.toLowerCase()));
    expect(screen.getByTestId('schedule-count')).toHaveTextContent(`${1 + others.length} of ${schedule.cables.length} cables`);
  });

  it('finds the cables of a device, and narrows by port as more is typed', async () => {
    const schedule = serve();
    renderWithClient(<ScheduleScreen id={1} n={2} />);
    const search = await screen.findByTestId('schedule-search');
    const device = schedule.cables[0].b.device;
    fireEvent.changeText(search, device);
    const ofDevice = schedule.cables.filter((c) => touches(c, device));
    expect(ofDevice.length).toBeGreaterThan(1);
    expect(await screen.findByTestId('schedule-count')).toHaveTextContent(`${ofDevice.length} of ${schedule.cables.length} cables`);
    const target = ofDevice[0];
    const port = target.a.device === device ? target.a.port : target.b.port;
    fireEvent.changeText(search, `${device} ${target.a.part ?? ''} ${port}`.replace(/\s+/g, ' '));
    expect(await screen.findByTestId(`schedule-card-${target.id}`)).toBeOnTheScreen();
    expect(screen.getByTestId('schedule-count')).not.toHaveTextContent(`${ofDevice.length} of`);
  });

  it('opens the cable detail of the card tapped, with the id percent-encoded', async () => {
    const schedule = serve();
    renderWithClient(<ScheduleScreen id={1} n={2} />);
    const row = schedule.cables[0];
    fireEvent.press(await screen.findByTestId(`schedule-card-${row.id}`));
    expect(mockPush).toHaveBeenCalledWith(`/designs/1/versions/2/cables/${encodeURIComponent(row.id)}`);
  });

  it('says so when nothing matches', async () => {
    serve();
    renderWithClient(<ScheduleScreen id={1} n={2} />);
    fireEvent.changeText(await screen.findByTestId('schedule-search'), 'no-such-cable-zz');
    expect(await screen.findByTestId('schedule-empty')).toHaveTextContent(/No cable matches/);
  });

  it('renders a screenful of 10,000 cables, not all of them, and still finds the last one', async () => {
    const base = cableSchedule(docs.v2).cables;
    const cables = Array.from({ length: 10_000 }, (_, i) => {
      const row = base[i % base.length];
      return { ...row, id: `cable-${i}`, label: `BIG-${String(i).padStart(5, '0')}` };
    });
    serve({ cables, totals: [] });
    renderWithClient(<ScheduleScreen id={1} n={2} />);
    await screen.findByTestId('schedule-list');
    const drawn = screen.queryAllByTestId(/^schedule-card-/).length;
    expect(drawn).toBeGreaterThan(0);
    expect(drawn).toBeLessThan(200);
    fireEvent.changeText(screen.getByTestId('schedule-search'), 'big-09999');
    expect(await screen.findByTestId('schedule-card-cable-9999')).toBeOnTheScreen();
    expect(screen.getByTestId('schedule-count')).toHaveTextContent('1 of 10000 cables');
  });
});

describe('schedule on a wide screen', () => {
  beforeEach(() => dimensions.mockReturnValue(desk));

  const shownLabels = () => screen.queryAllByTestId(/^schedule-row-/).map((row) => within(row).getAllByText(/.+/)[0].props.children as string);

  it('sorts by label both ways in natural order', async () => {
    const schedule = serve();
    renderWithClient(<ScheduleScreen id={1} n={2} />);
    fireEvent.press(await screen.findByTestId('schedule-sort-label'));
    const ascending = [...schedule.cables.map((c) => c.label)].sort(naturalCompare);
    expect(shownLabels()).toEqual(ascending.slice(0, shownLabels().length));
    fireEvent.press(screen.getByTestId('schedule-sort-label'));
    expect(shownLabels()).toEqual([...ascending].reverse().slice(0, shownLabels().length));
  });

  it('filters by rack, media and network, matching either end', async () => {
    const schedule = serve();
    renderWithClient(<ScheduleScreen id={1} n={2} />);
    await screen.findByTestId('schedule-filters');
    // The demo has racks A01 and A02 (issue 10).
    fireEvent.press(screen.getByTestId('schedule-filter-rack-A02'));
    const inA02 = schedule.cables.filter((c) => c.a.rack === 'A02' || c.b.rack === 'A02');
    expect(inA02.length).toBeGreaterThan(0);
    expect(screen.getByTestId('schedule-count')).toHaveTextContent(`${inA02.length} of ${schedule.cables.length} cables`);
    fireEvent.press(screen.getByTestId('schedule-filter-rack-all'));
    const network = schedule.cables[0].network!;
    fireEvent.press(screen.getByTestId(`schedule-filter-network-${network}`));
    const onNetwork = schedule.cables.filter((c) => c.network === network);
    expect(screen.getByTestId('schedule-count')).toHaveTextContent(`${onNetwork.length} of ${schedule.cables.length} cables`);
    const media = schedule.cables[0].media;
    fireEvent.press(screen.getByTestId(`schedule-filter-media-${media}`));
    const both = onNetwork.filter((c) => c.media === media);
    expect(screen.getByTestId('schedule-count')).toHaveTextContent(`${both.length} of ${schedule.cables.length} cables`);
  });

  it('filters by device on either end', async () => {
    const schedule = serve();
    renderWithClient(<ScheduleScreen id={1} n={2} />);
    const device = schedule.cables[schedule.cables.length - 1].b.device;
    fireEvent.changeText(await screen.findByTestId('schedule-filter-device'), device);
    const ofDevice = schedule.cables.filter((c) => c.a.device.includes(device) || c.b.device.includes(device));
    expect(screen.getByTestId('schedule-count')).toHaveTextContent(`${ofDevice.length} of ${schedule.cables.length} cables`);
    for (const row of screen.getAllByTestId(/^schedule-row-/)) expect(row).toHaveTextContent(new RegExp(device));
  });
});
