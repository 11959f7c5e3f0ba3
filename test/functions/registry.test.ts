import { describe, it, expect } from 'vitest';
import { specs, functions, specByName } from '../../src/functions';

// Names the host already uses for its own complex-number functions: ours must not echo them.
const HOST_COMPLEX = /^(IM[A-Z]+|COMPLEX)$/;

describe('the registry', () => {
  it('lists every spec once under its name, and every name has an implementation', () => {
    const names = specs.map((s) => s.name);
    expect(new Set(names).size).toBe(names.length);
    expect(Object.keys(functions)).toEqual(names);
    expect(Object.keys(specByName)).toEqual(names);
  });

  it.each(specs.map((s) => [s.name, s] as const))('%s is documented and well formed', (name, s) => {
    expect(name).toMatch(/^[A-Z][A-Z0-9]*$/);
    expect(name).not.toMatch(HOST_COMPLEX);
    expect(s.summary.length).toBeGreaterThan(10);
    expect(s.result.length).toBeGreaterThan(5);
    expect(s.errors.length).toBeGreaterThan(0);
    expect(s.examples.length).toBeGreaterThan(0);
    for (const e of s.examples) expect(e.formula.startsWith(`=PHZ.${name}(`)).toBe(true);
    for (const p of s.params) {
      expect(p.name).toMatch(/^[a-z][a-z0-9_]*$/);
      expect(p.description.length).toBeGreaterThan(5);
    }
    // optional arguments come last; a repeating argument is the very last
    const firstOptional = s.params.findIndex((p) => p.optional);
    if (firstOptional >= 0) expect(s.params.slice(firstOptional).every((p) => p.optional)).toBe(true);
    const repeat = s.params.findIndex((p) => p.type === 'repeat');
    if (repeat >= 0) expect(repeat).toBe(s.params.length - 1);
  });

  it('gives every phasor-text function an optional last digits argument, unless a repeating argument must be last', () => {
    for (const s of specs) {
      const textPhasor = s.examples.some((e) => e.result.some((r) => r.some((c) => typeof c === 'string' && c.includes('∠'))));
      const repeat = s.params.some((p) => p.type === 'repeat');
      if (textPhasor && !repeat) expect(s.params[s.params.length - 1].name, s.name).toBe('digits');
    }
  });
});
