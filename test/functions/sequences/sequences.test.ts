import { describe, expect, it } from 'vitest';
import { polarDeg, rect, magnitude, angleDeg } from '../../../src/core/phasor';
import { expectClose, expectPhasorClose } from '../../helpers';
import { call, col, expectMessage, phs } from '../sets/_cells';

describe('PHZ.SEQCOMP', () => {
  it('Grainger & Stevenson, Power System Analysis (1994), Example 11.1 (from memory): line c open, Ia = 10∠0°, Ib = 10∠180° → 0, 5.78∠−30°, 5.78∠30°', () => {
    const [i0, i1, i2] = phs(call('SEQCOMP', col('10∠0', '10∠180', 0), 15));
    expect(magnitude(i0)).toBe(0);
    expectClose(magnitude(i1), 5.78, 2e-3);
    expectClose(angleDeg(i1), -30, 1e-9);
    expectClose(angleDeg(i2), 30, 1e-9);
  });
  it('Glover, Sarma & Overbye, Power System Analysis and Design, Example 8.1 (from memory): balanced 277 V → 0, 277∠0°, 0', () => {
    expect(call('SEQCOMP', call('BALANCED', 277))).toEqual([['0'], ['277∠0°'], ['0']]);
  });
  it('range input: a row, and real/imaginary columns', () => {
    const a = call('SEQCOMP', [['10∠0', '10∠180', 0]], 15);
    const b = call('SEQCOMP', [[10, 0], [-10, 0], [0, 0]], 15);
    expect(a).toEqual(b);
  });
  it('blank cell and wrong type', () => {
    expectMessage(() => call('SEQCOMP', col(1, null, 2)), /phases, row 2 is blank/);
    expectMessage(() => call('SEQCOMP', col(1, 'x', 2)), /phases, row 2/);
  });
  it('wrong count: two values', () => {
    expectMessage(() => call('SEQCOMP', col(1, 2)), /phases holds 2 values but needs three/);
  });
  it('domain: a zero set has zero components', () => {
    expect(call('SEQCOMP', col(0, 0, 0))).toEqual([['0'], ['0'], ['0']]);
  });
});

describe('PHZ.FROMSEQCOMP', () => {
  it('normal use: three separate components', () => {
    const r = phs(call('FROMSEQCOMP', 10, 100, 0, 15));
    expectPhasorClose(r[0], rect(110));
    expectPhasorClose(r[1], rect(10).add(polarDeg(100, -120)));
  });
  it('Grainger & Stevenson Example 11.1 reversed (from memory): 0, 5.7735∠−30°, 5.7735∠30° → 10∠0°, 10∠180°, 0', () => {
    const r = phs(call('FROMSEQCOMP', col(0, `${10 / Math.sqrt(3)}∠-30`, `${10 / Math.sqrt(3)}∠30`), null, null, 15));
    expectPhasorClose(r[0], rect(10), 1e-12);
    expectPhasorClose(r[1], rect(-10), 1e-12);
    expect(magnitude(r[2])).toBe(0);
  });
  it('range input: the SEQUENCE result round-trips', () => {
    const x = col('231∠3', '219∠-125', '240∠117');
    const r = phs(call('FROMSEQCOMP', call('SEQCOMP', x, 15), null, null, 15));
    expectPhasorClose(r[0], polarDeg(231, 3), 1e-12);
    expectPhasorClose(r[2], polarDeg(240, 117), 1e-12);
  });
  it('blank cell, wrong type, wrong count', () => {
    expectMessage(() => call('FROMSEQCOMP', col(0, '', 1)), /zero, row 2 is blank/);
    expectMessage(() => call('FROMSEQCOMP', 0, 'x', 1), /positive/);
    expectMessage(() => call('FROMSEQCOMP', 0, 1), /give one range of three values, or three separate values/);
    expectMessage(() => call('FROMSEQCOMP', col(0, 1)), /zero holds 2 values but needs three/);
  });
});
