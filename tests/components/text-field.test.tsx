import { render, screen } from '@testing-library/react-native';
import { TextField } from '@/components/ui/TextField';

describe('TextField', () => {
  it('shows its label and, when given, the error under the input', () => {
    render(<TextField label="E-mail" testID="field" value="" onChangeText={() => {}} error="Enter an e-mail address" />);
    expect(screen.getByLabelText('E-mail')).toBeOnTheScreen();
    expect(screen.getByTestId('field-error')).toHaveTextContent('Enter an e-mail address');
    expect(screen.getByRole('alert')).toHaveTextContent('Enter an e-mail address');
  });

  it('shows no error area while there is no error, but keeps the hint', () => {
    render(<TextField label="Password" hint="At least 12 characters." testID="field" value="" onChangeText={() => {}} />);
    expect(screen.queryByTestId('field-error')).toBeNull();
    expect(screen.queryByRole('alert')).toBeNull();
    expect(screen.getByText('At least 12 characters.')).toBeOnTheScreen();
  });
});
