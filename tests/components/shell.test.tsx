import { screen } from '@testing-library/react-native';
import { Text } from 'react-native';
import { Shell } from '@/components/shell/Shell';
import type { User } from '@/shared/api/auth';
import { demoUsers, renderWithClient } from './helpers/render';

jest.mock('react-native/Libraries/Utilities/useWindowDimensions', () => ({ __esModule: true, default: jest.fn() }));
jest.mock('expo-router', () => ({
  usePathname: () => '/designs',
  Link: ({ children }: { children: React.ReactNode }) => children,
}));

const dimensions: jest.Mock = jest.requireMock('react-native/Libraries/Utilities/useWindowDimensions').default;
function windowOf(width: number, height: number) {
  dimensions.mockReturnValue({ width, height, scale: 1, fontScale: 1 });
}

function renderShell(user: User = demoUsers.admin) {
  return renderWithClient(
    <Shell user={user} teamName="Tidewater Cold Storage">
      <Text>screen content</Text>
    </Shell>,
    { user },
  );
}

describe('signed-in shell', () => {
  it('shows bottom tabs and a header with team and user on a 390 px phone', () => {
    windowOf(390, 844);
    renderShell();
    expect(screen.getByTestId('nav-tabs')).toBeOnTheScreen();
    expect(screen.queryByTestId('nav-sidebar')).toBeNull();
    expect(screen.getByTestId('top-bar')).toHaveTextContent(/Tidewater Cold Storage/);
    expect(screen.getByTestId('top-bar')).toHaveTextContent(/Maya Okafor/);
    expect(screen.getByText('screen content')).toBeOnTheScreen();
  });

  it('shows a sidebar and no tabs at 1440 px', () => {
    windowOf(1440, 900);
    renderShell();
    expect(screen.getByTestId('nav-sidebar')).toHaveTextContent(/Tidewater Cold Storage/);
    expect(screen.queryByTestId('nav-tabs')).toBeNull();
    expect(screen.queryByTestId('top-bar')).toBeNull();
  });

  it('switches to the sidebar exactly at 1024 px and keeps tabs at 1023', () => {
    windowOf(1023, 768);
    const { unmount } = renderShell();
    expect(screen.getByTestId('nav-tabs')).toBeOnTheScreen();
    unmount();
    windowOf(1024, 768);
    renderShell();
    expect(screen.getByTestId('nav-sidebar')).toBeOnTheScreen();
  });

  it('offers Team and Mailbox to an admin but not to a designer', () => {
    windowOf(390, 844);
    const { unmount } = renderShell(demoUsers.admin);
    expect(screen.getByTestId('nav-team')).toBeOnTheScreen();
    expect(screen.getByTestId('nav-mailbox')).toBeOnTheScreen();
    unmount();
    renderShell(demoUsers.designer);
    expect(screen.getByTestId('nav-designs')).toBeOnTheScreen();
    expect(screen.getByTestId('nav-account')).toBeOnTheScreen();
    expect(screen.queryByTestId('nav-team')).toBeNull();
    expect(screen.queryByTestId('nav-mailbox')).toBeNull();
  });

  it('marks the current destination for assistive technology', () => {
    windowOf(1440, 900);
    renderShell();
    expect(screen.getByTestId('nav-designs').props['aria-current']).toBe('page');
    expect(screen.getByTestId('nav-account').props['aria-current']).toBeUndefined();
  });
});
