import { describe, it, expect } from 'vitest';
import { formatPolar, formatRect, formatNumber } from '../../src/core/format';
import { rect, polarDeg } from '../../src/core/phasor';
import { expectPhzError } from '../helpers';

// Formatter tests compare text: the text is what they are about.
describe('formatPolar', () => {
  it.each([
    [rect(24.5413202645705, -9.2777977948315), 6, '26.2365∠-20.709°'],
    [rect(3, 4), 6, '5∠53.1301°'],
    [rect(3, 4), 3, '5∠53.1°'],
    [rect(3, 4), 15, '5∠53.1301023541560°'.replace('0°', '°')],
    [polarDeg(230, -120), 6, '230∠-120°'],
    [rect(-10, 0), 6, '10∠180°'],
    [rect(-10, -0), 6, '10∠180°'],
    [rect(-10, -1e-15), 6, '10∠180°'],
    [rect(-1, -1e-7), 6, '1∠180°'], // −179.99999… rounds to −180, shown as 180
    [rect(0, 0), 6, '0'],
    [rect(1e-20, 0), 6, '1e-20∠0°'],
    [rect(1234567, 0), 6, '1234570∠0°'],
    [rect(0, -2), 6, '2∠-90°'],
    [rect(1, 1e-13), 6, '1∠0°'], // imaginary part within 1e-12 of the magnitude is noise
  ])('%o at %i digits → %s', (z, digits, text) => {
    expect(formatPolar(z, digits)).toBe(text);
  });

  it('gives magnitude and angle each their own significant figures', () => {
    expect(formatPolar(polarDeg(0.00123456789, 1.23456789), 4)).toBe('0.001235∠1.235°');
  });
});

describe('formatRect', () => {
  it.each([
    [rect(24.54132, -9.27780), 6, '24.5413-j9.2778'],
    [rect(0, -3), 6, '-j3'],
    [rect(0, 3), 6, 'j3'],
    [rect(4, 0), 6, '4'],
    [rect(-4, 0), 6, '-4'],
    [rect(0, 0), 6, '0'],
    // both parts rounded at the decimal place of the larger part
    [rect(1000.123, 0.0004), 6, '1000.12'],
    [rect(1000.123, 0.004), 6, '1000.12'],
    [rect(1000.123, 0.006), 6, '1000.12+j0.01'],
    [rect(123456789, 54321), 3, '123000000+j0'.replace('+j0', '')],
    [rect(123456789, 5432100), 3, '123000000+j5000000'],
    [rect(9.9999996, 1), 6, '10+j1'],
    [rect(-0.0000001, 5), 6, 'j5'], // never -0
    [rect(-115.00000000000004, -199.1858428704209), 6, '-115-j199.186'],
  ])('%o at %i digits → %s', (z, digits, text) => {
    expect(formatRect(z, digits)).toBe(text);
  });
});

describe('formatNumber', () => {
  it.each([
    [0, '0'],
    [-0, '0'],
    [-1e-30, '-1e-30'],
    [123.4564999, '123.456'],
    [0.1 + 0.2, '0.3'],
  ])('%d → %s', (x, text) => expect(formatNumber(x, 6)).toBe(text));
});

describe('non-finite values are errors, never text', () => {
  it.each([rect(Infinity, 0), rect(0, NaN)])('%o', (z) => {
    expect(expectPhzError(() => formatPolar(z)).message).toMatch(/not a finite number/);
    expect(expectPhzError(() => formatRect(z)).message).toMatch(/not a finite number/);
  });
});
