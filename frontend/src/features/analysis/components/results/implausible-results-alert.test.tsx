import { render, screen } from '@testing-library/react';
import { ImplausibleResultsAlert } from './implausible-results-alert';

describe('ImplausibleResultsAlert', () => {
  it('shows each flag with its storey, in an alert', () => {
    render(
      <ImplausibleResultsAlert
        flags={[
          { storey: 2, message: 'Storey 2 drifts 900% of its height: no building stands at that.' },
        ]}
      />,
    );
    const alert = screen.getByRole('alert', { name: 'Implausible results' });
    expect(alert).toHaveTextContent('These results look impossible for a real building');
    expect(alert).toHaveTextContent('Storey 2 drifts 900% of its height');
  });

  it('shows nothing when there is nothing to flag', () => {
    const { container } = render(<ImplausibleResultsAlert flags={[]} />);
    expect(container).toBeEmptyDOMElement();
  });
});
