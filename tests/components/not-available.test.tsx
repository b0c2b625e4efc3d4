import { render, screen } from '@testing-library/react-native';
import { NotAvailable, rolesInWords } from '@/components/shell/NotAvailable';

jest.mock('expo-router', () => ({ Link: ({ children }: { children: React.ReactNode }) => children }));

describe('a screen the role may not use', () => {
  it('names the roles that may use it, from the role table (docs/api.md)', () => {
    expect(rolesInWords('markBuild')).toBe('installers and team admins');
    expect(rolesInWords('manageTeam')).toBe('team admins');
    expect(rolesInWords('readAllVersions')).toBe('designers, reviewers and team admins');
  });

  it('tells a designer on Site work that it is for installers and team admins', () => {
    render(<NotAvailable screen="Site work" role="designer" capability="markBuild" />);
    expect(screen.getByText('Site work is not available for your role')).toBeTruthy();
    expect(screen.getByText(/signed in as a designer\. Site work is for installers and team admins;/)).toBeTruthy();
  });
});
