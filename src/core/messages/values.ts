/** Messages of the formatter and the value and arithmetic functions. */
export const valueMessages = {
  notFinite:
    'the result is not a finite number (a division by zero or an overflow): check the inputs for zero impedances, open circuits or zero voltages',
  divideByZero(where: string): string {
    return `${where} is 0: division by zero; give a non-zero divisor`;
  },
  inverseOfZero(where: string): string {
    return `${where} is 0: it has no inverse (an impedance of 0 Ω is a short circuit with unbounded admittance)`;
  },
  negativeMagnitude(where: string, value: number): string {
    return `${where} is ${value}: give a magnitude of 0 or more, and add 180° to the angle to reverse the phasor`;
  },
  resonance:
    'the admittances add up to zero (the branches resonate), so the parallel impedance is unbounded: check the reactances',
};
