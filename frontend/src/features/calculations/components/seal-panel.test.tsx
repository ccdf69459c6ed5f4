import { screen } from '@testing-library/react';
import type { CalculationDto, SealCheckResponse, SealDto } from '@tiermode/shared-types';
import { api } from '@/lib/api-client';
import { renderWithProviders } from '@/testing/render';
import { SealPanel } from './seal-panel';

const seal: SealDto = {
  hash: 'a'.repeat(64),
  reviewerId: 'r1',
  reviewerName: 'Ines Reviewer',
  licenseNumber: 'SE-1 (invented)',
  licenseJurisdiction: 'Invented State',
  statement: 'Accepted (test).',
  lockedAt: '2026-11-30T10:00:00.000Z',
  sealVersion: 2,
  signature: 'c2ln',
  keyId: '0123456789abcdef',
};
const calc = { id: 'c1', seal } as CalculationDto;

function answer(check: Partial<SealCheckResponse>) {
  vi.spyOn(api, 'get').mockResolvedValue({
    data: {
      valid: true,
      hash: seal.hash,
      recomputed: seal.hash,
      seal,
      hashValid: true,
      signature: 'valid',
      lockEvent: 'valid',
      problems: [],
      ...check,
    },
  });
}

describe('SealPanel', () => {
  afterEach(() => vi.restoreAllMocks());

  it('shows who locked, under which licence, the statement and the hash, and that it holds', async () => {
    answer({ valid: true });
    renderWithProviders(<SealPanel calc={calc} />);
    expect(await screen.findByRole('status')).toHaveTextContent('The seal is valid');
    expect(screen.getByText('Ines Reviewer')).toBeInTheDocument();
    expect(screen.getByText('SE-1 (invented), Invented State')).toBeInTheDocument();
    expect(screen.getByText(seal.hash)).toBeInTheDocument();
    expect(
      screen.getByText('verifies with the server’s key (Ed25519, key 0123456789abcdef)'),
    ).toBeInTheDocument();
    expect(screen.getByText('on the audit trail, signed')).toBeInTheDocument();
    expect(api.get).toHaveBeenCalledWith('/calculations/c1/seal');
  });

  it('warns, with the recomputed hash, when what is stored no longer matches the seal', async () => {
    answer({
      valid: false,
      recomputed: 'b'.repeat(64),
      hashValid: true,
      signature: 'invalid',
      problems: ["The seal's signature does not verify with this server's key"],
    });
    renderWithProviders(<SealPanel calc={calc} />);
    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('The seal does not hold');
    expect(alert).toHaveTextContent("The seal's signature does not verify with this server's key.");
    expect(alert).toHaveTextContent('b'.repeat(64));
    expect(screen.getByText('does not verify (Ed25519, key 0123456789abcdef)')).toBeInTheDocument();
    expect(screen.queryByText(/The seal is valid/)).not.toBeInTheDocument();
  });
});
