import { formatNumber, fromDisplay, massHeader, toDisplay, unitLabel } from './units';

describe('units', () => {
  it('shows SI working units: t, kN/m, kN, kN·m, mm', () => {
    expect(toDisplay('SI', 'mass', 250_000)).toBeCloseTo(250, 12);
    expect(toDisplay('SI', 'stiffness', 3.5e8)).toBeCloseTo(350_000, 9);
    expect(toDisplay('SI', 'force', 12_000)).toBeCloseTo(12, 12);
    expect(toDisplay('SI', 'moment', 5e6)).toBeCloseTo(5000, 9);
    expect(toDisplay('SI', 'displacement', 0.0125)).toBeCloseTo(12.5, 12);
    expect(unitLabel('SI', 'moment')).toBe('kN·m');
  });

  it('converts US customary units by their definitions (1 ft = 0.3048 m, 1 lbf = 4.4482216152605 N)', () => {
    expect(toDisplay('US', 'length', 3.048)).toBeCloseTo(10, 12);
    expect(toDisplay('US', 'force', 4448.2216152605)).toBeCloseTo(1, 9);
    // 1 kip/in = 4448.2216152605 N / 0.0254 m = 175,126.835 N/m
    expect(fromDisplay('US', 'stiffness', 1)).toBeCloseTo(175_126.835, 2);
    expect(toDisplay('US', 'displacement', 0.0254)).toBeCloseTo(1, 12);
  });

  it('shows mass as seismic weight W = m g in US units and converts back', () => {
    // 100 kip = 444,822 N; / 9.80665 m/s^2 = 45,359.2 kg
    expect(fromDisplay('US', 'mass', 100)).toBeCloseTo(45_359.237, 2);
    expect(toDisplay('US', 'mass', fromDisplay('US', 'mass', 812.5))).toBeCloseTo(812.5, 9);
    expect(massHeader('US')).toBe('Seismic weight (kip)');
    expect(massHeader('SI')).toBe('Mass (t)');
  });

  it('shows E in GPa or ksi and I in cm⁴ or in⁴ (1 in = 25.4 mm)', () => {
    expect(toDisplay('SI', 'modulus', 30e9)).toBeCloseTo(30, 12);
    expect(toDisplay('US', 'modulus', 200e9)).toBeCloseTo(29_007.5, 1); // 200 GPa = 29,008 ksi
    expect(toDisplay('SI', 'secondMoment', 2.1333e-3)).toBeCloseTo(213_330, 6);
    expect(fromDisplay('US', 'secondMoment', 1)).toBeCloseTo(0.0254 ** 4, 15);
  });

  it('round-trips every quantity', () => {
    for (const system of ['SI', 'US'] as const) {
      for (const quantity of [
        'length',
        'mass',
        'stiffness',
        'force',
        'moment',
        'displacement',
      ] as const) {
        expect(fromDisplay(system, quantity, toDisplay(system, quantity, 1234.5))).toBeCloseTo(
          1234.5,
          8,
        );
      }
    }
  });

  it('formats numbers to four significant figures', () => {
    expect(formatNumber(0.68516945)).toBe('0.6852');
    expect(formatNumber(350000)).toBe('350,000');
    expect(formatNumber(1.23456e-5)).toBe('1.235e-5');
    expect(formatNumber(Number.NaN)).toBe('—');
  });
});
