import { render, screen } from '@testing-library/react';
import { CautionBanner } from './caution-banner';

describe('CautionBanner', () => {
  it('states that the code and the engineer of record govern', () => {
    render(<CautionBanner />);
    const note = screen.getByRole('note', { name: 'Caution' });
    expect(note).toHaveTextContent('locally adopted building code governs');
    expect(note).toHaveTextContent('engineer of record has accepted it');
  });
});
