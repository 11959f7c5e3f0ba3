/**
 * Cells holding Excel data types. Each shape is the JSON the Office documentation shows
 * (page title beside it); values of our own appear only where a shape needs a phasor.
 *
 * How they arrive: with `allowCustomDataForDataTypeAny` the custom-functions runtime hands
 * each such argument over as `JSON.parse(element.value)` (CustomFunctionProxy.
 * _transferCustomFunctionRichData in @microsoft/office-js 1.1.110,
 * dist/custom-functions-runtime.debug.js), and "custom functions use the same JSON schema
 * for data types as the Excel JavaScript API" (Use data types with custom functions in
 * Excel). `arrive` reproduces that round trip, so the readers see plain parsed objects.
 */
import { describe, expect, it } from 'vitest';
import * as math from 'mathjs';
import { describeObject, errorName, phasorProperties, plainCell } from '../../src/functions/cellvalues';
import { asMatrix, readBoolean, readChoice, readNumber, readNumbers, readPhasor, readPhasors } from '../../src/functions/readers';
import { functions } from '../../src/functions';
import { expectClose, expectPhasorClose, expectPhzError } from '../helpers';

/** What the runtime passes for a rich cell: the JSON Excel sends, parsed. */
function arrive<T>(cellValue: T): T {
  const element = { value: JSON.stringify(cellValue) }; // what Excel sends for a rich cell
  return JSON.parse(element.value) as T; // what the runtime passes to the function
}

// "Add properties to basic cell values": a number (double) with properties.
const BILL = arrive({
  type: 'Double',
  basicType: 'Double',
  basicValue: 104.67,
  properties: {
    Food: { type: 'String', basicType: 'String', basicValue: 'Sandwich and fries' },
    Drinks: { type: 'String', basicType: 'String', basicValue: 'Soda' },
    Tax: { type: 'Double', basicType: 'Double', basicValue: 5.5 },
    Tip: { type: 'Double', basicType: 'Double', basicValue: 21 },
  },
});
// "Add properties to basic cell values", Formatted number values: a double with numberFormat.
const CURRENCY = arrive({
  type: 'Double',
  basicType: 'Double',
  basicValue: 24,
  numberFormat: '$0.00',
  properties: { Name: { type: 'String', basicValue: 'dollar' } },
});
// "Excel data types core concepts", Formatted number values (FormattedNumberCellValue).
const MY_DATE = arrive({ type: 'FormattedNumber', basicValue: 32889.0, basicType: 'Double', numberFormat: 'm/d/yyyy' });
// "Use data types with custom functions in Excel", Output a formatted number (what a function returns).
const PERCENT = arrive({ type: 'Double', basicValue: 0.5, numberFormat: '0.00%' });
// "Add properties to basic cell values", Card layout: a string with properties (layouts left out).
const SCISSORS = arrive({
  type: 'String',
  basicType: 'String',
  basicValue: 'Scissors',
  properties: {
    'Product Name': { type: 'String', basicType: 'String', basicValue: 'Scissors' },
    Discontinued: { type: 'Boolean', basicType: 'Boolean', basicValue: false },
  },
});
// "Add properties to basic cell values", Nested data types: a Boolean cell value.
const CHARGING = arrive({ type: 'Boolean', basicType: 'Boolean', basicValue: true });
// "Excel data types core concepts", Web image values.
const MY_IMAGE = arrive({ type: 'WebImage', address: 'https://bit.ly/2YGOwtw', basicType: 'Error', basicValue: '#VALUE!' });
// "Excel data types core concepts", Entity values (myImage and myDate as above).
const LLAMA = arrive({
  type: 'Entity',
  text: 'A llama',
  properties: { image: MY_IMAGE, 'start date': MY_DATE, quote: { type: 'String', basicValue: 'I love llamas.' } },
  basicType: 'Error',
  basicValue: '#VALUE!',
});
// "Excel.LinkedEntityCellValue interface", example (layouts left out).
const CHAI = arrive({
  type: 'LinkedEntity',
  text: 'Chai',
  id: { entityId: 'P1', domainId: 'products', serviceId: 268436224, culture: 'en-US' },
  properties: {
    'Product Name': { type: 'String', basicValue: 'Chai' },
    'Unit Price': { type: 'FormattedNumber', basicValue: 18, numberFormat: '$* #,##0.00' },
    Discontinued: { type: 'Boolean', basicValue: false },
  },
});
// "Excel.Div0ErrorCellValue interface" / "Excel data types core concepts", Improved error support.
const DIV0 = arrive({ type: 'Error', errorType: 'Div0', basicValue: '#DIV/0!', basicType: 'Error' });
// "Excel.RefErrorCellValue interface": basicValue is optional; errorType names the error.
const REF_NO_TEXT = arrive({ type: 'Error', errorType: 'Ref' });
// "Excel.EmptyCellValue interface".
const EMPTY = arrive({ type: 'Empty', basicValue: '', basicType: 'Empty' });
// "Excel.ArrayCellValue interface": elements are cell values.
const ARRAY = arrive({ type: 'Array', basicType: 'Error', basicValue: '#VALUE!', elements: [[{ type: 'Double', basicValue: 1 }]] });

/** Entities in the documented EntityCellValue shape carrying phasors of our own (a feeder impedance, a voltage). */
const feederZ = (props: Record<string, unknown>) =>
  arrive({ type: 'Entity', text: 'Feeder F2 impedance', properties: props, basicType: 'Error', basicValue: '#VALUE!' });
const dbl = (n: number, numberFormat?: string) => ({ type: 'Double', basicType: 'Double', basicValue: n, ...(numberFormat ? { numberFormat } : {}) });

describe('plainCell: basic values of data-type cells', () => {
  it.each([
    ['Double with properties (Add properties to basic cell values)', BILL, 104.67],
    ['Double with a number format (Add properties to basic cell values)', CURRENCY, 24],
    ['FormattedNumber (Excel data types core concepts)', MY_DATE, 32889],
    ['Double returned by a custom function (Use data types with custom functions in Excel)', PERCENT, 0.5],
    ['String with properties (Add properties to basic cell values)', SCISSORS, 'Scissors'],
    ['Boolean (Add properties to basic cell values)', CHARGING, true],
    ['Empty (Excel.EmptyCellValue interface)', EMPTY, null],
  ])('%s', (_, cell, plain) => {
    expect(plainCell(cell)).toBe(plain);
  });
  it('keeps entities, images, errors, plain values and malformed objects as they are', () => {
    for (const v of [LLAMA, CHAI, MY_IMAGE, DIV0, ARRAY, 7, 'x', null]) expect(plainCell(v)).toBe(v);
    const noNumber = { type: 'Double', basicValue: '12' };
    expect(plainCell(noNumber)).toBe(noNumber);
  });
  it('asMatrix gives plain cells, and the very same rows when no cell is an object', () => {
    const rows = [['1+j'], [2]];
    expect(asMatrix(rows)).toBe(rows);
    expect(asMatrix([[BILL, EMPTY], [SCISSORS, CHARGING]])).toEqual([[104.67, null], ['Scissors', true]]);
    expect(asMatrix(MY_DATE)).toEqual([[32889]]);
  });
});

describe('errorName and describeObject', () => {
  it('names errors as Excel shows them', () => {
    expect(errorName(DIV0)).toBe('#DIV/0!');
    expect(errorName(REF_NO_TEXT)).toBe('#REF!');
    expect(errorName({ type: 'Error' })).toBe('');
    // CustomFunctions.Error serialises with type "Error" and its code as basicValue (custom-functions-runtime)
    expect(errorName({ type: 'Error', code: '#N/A', basicValue: '#N/A' })).toBe('#N/A');
    expect(errorName(LLAMA)).toBeUndefined();
    expect(errorName(BILL)).toBeUndefined();
  });
  it('names what a cell holds', () => {
    expect(describeObject(LLAMA)).toBe('the entity "A llama"');
    expect(describeObject(CHAI)).toBe('the linked data type "Chai"');
    expect(describeObject(MY_IMAGE)).toBe('an image');
    expect(describeObject(ARRAY)).toBe('an array data type');
    expect(describeObject({ type: 'Gizmo' })).toBe('a data type of kind "Gizmo"');
    expect(describeObject({})).toBe('a value that is neither a number nor text');
    expect(describeObject({ type: 'Entity', text: 'x'.repeat(80) })).toBe(`the entity "${'x'.repeat(29)}…"`);
  });
  it('finds phasor properties case-insensitively, rectangular before polar', () => {
    expect(phasorProperties(feederZ({ Real: 1, IMAG: 2, magnitude: 3, angle: 4 }))).toMatchObject({ kind: 'rect', names: ['Real', 'IMAG'] });
    expect(phasorProperties(feederZ({ Mag: 3, 'Angle (deg)': 4 }))).toMatchObject({ kind: 'polar', radians: false, names: ['Mag', 'Angle (deg)'] });
    expect(phasorProperties(feederZ({ magnitude: 3, angle_rad: 4 }))).toMatchObject({ kind: 'polar', radians: true });
    expect(phasorProperties(feederZ({ re: 3 }))).toEqual({ kind: 'half', has: 're', missing: 'imag' });
    expect(phasorProperties(LLAMA)).toEqual({ kind: 'none' });
  });
});

describe('phasor readers with data-type cells', () => {
  it('reads text and numbers with properties through their basic value', () => {
    const text = arrive({ ...SCISSORS, basicValue: '230∠-120' });
    expectPhasorClose(readPhasor([[text]], 'v'), { re: -115, im: -230 * Math.sin(Math.PI / 3) });
    expectPhasorClose(readPhasor([[BILL]], 'z'), { re: 104.67, im: 0 });
    expectPhasorClose(readPhasor(MY_DATE, 'z'), { re: 32889, im: 0 });
  });
  it('reads two columns of number data types as real/imaginary pairs, Empty cells as blanks', () => {
    const zs = readPhasors(arrive([[dbl(0.32), dbl(0.11, '0.00 "Ω"')], [EMPTY, EMPTY], [MY_DATE, 5]]), 'z', { blanks: 'skip' });
    expect(zs.map((z) => [z.re, z.im])).toEqual([[0.32, 0.11], [32889, 5]]);
  });
  it('reads an entity with real and imag properties (cell values or plain numbers, any case)', () => {
    expectPhasorClose(readPhasor([[feederZ({ Real: dbl(0.32), Imag: dbl(0.11) })]], 'z'), { re: 0.32, im: 0.11 });
    expectPhasorClose(readPhasor([[feederZ({ re: 0.32, im: '-0,11' })]], 'z'), { re: 0.32, im: -0.11 });
  });
  it('reads an entity with magnitude and angle in degrees or radians', () => {
    // independent check: mathjs complex from polar coordinates
    const ref = math.complex({ r: 6.35, phi: (-30 * Math.PI) / 180 });
    expectPhasorClose(readPhasor([[feederZ({ Magnitude: dbl(6.35), Angle: dbl(-30, '0.0"°"') })]], 'v'), { re: ref.re, im: ref.im });
    expectPhasorClose(readPhasor([[feederZ({ magnitude: 6.35, angle_rad: (-30 * Math.PI) / 180 })]], 'v'), { re: ref.re, im: ref.im }, 1e-12);
  });
  it('reads a linked entity whose properties carry a phasor (Excel.LinkedEntityCellValue shape)', () => {
    const linked = arrive({ ...CHAI, text: 'Bus B3', properties: { real: { type: 'FormattedNumber', basicValue: 228.5, numberFormat: '0.0' }, imag: dbl(-4.2) } });
    expectPhasorClose(readPhasor([[linked]], 'v'), { re: 228.5, im: -4.2 });
  });
  it('refuses an entity without a phasor, naming it and the properties to give', () => {
    expect(expectPhzError(() => readPhasor([[LLAMA]], 'impedance')).message).toBe(
      'impedance holds the entity "A llama", whose properties carry no phasor: give it the properties real and imag, or magnitude and angle (degrees)',
    );
    expect(expectPhzError(() => readPhasors([['1'], [CHAI]], 'v')).message).toBe(
      'v, row 2 holds the linked data type "Chai", whose properties carry no phasor: give it the properties real and imag, or magnitude and angle (degrees)',
    );
  });
  it('refuses half a phasor, a bad property and a negative magnitude, naming the property', () => {
    expect(expectPhzError(() => readPhasor([[feederZ({ Real: dbl(0.32) })]], 'z')).message).toBe(
      'z holds the entity "Feeder F2 impedance" with the property "Real" but no "imag": give both (0 for a zero part)',
    );
    expect(expectPhzError(() => readPhasor([[feederZ({ real: 'low', imag: 1 })]], 'z')).message).toBe(
      'z, property "real" must be a number but is the text "low": give a plain number',
    );
    expect(expectPhzError(() => readPhasor([[feederZ({ real: DIV0, imag: 1 })]], 'z')).message).toBe(
      'z, property "real" holds the error #DIV/0!: fix the cell it comes from first',
    );
    expect(expectPhzError(() => readPhasor([[feederZ({ magnitude: -2, angle: 10 })]], 'z')).message).toMatch(
      /^z, property "magnitude" is -2: give a magnitude of 0 or more/,
    );
  });
  it('refuses errors naming the error, and other data types naming what they are', () => {
    expect(expectPhzError(() => readPhasors([['1'], [DIV0]], 'currents')).message).toBe(
      'currents, row 2 holds the error #DIV/0!: fix the cell it comes from first',
    );
    expect(expectPhzError(() => readPhasor([[REF_NO_TEXT]], 'z')).message).toBe('z holds the error #REF!: fix the cell it comes from first');
    expect(expectPhzError(() => readPhasor([[{ type: 'Error' }]], 'z')).message).toBe('z holds an error value: fix the cell it comes from first');
    expect(expectPhzError(() => readPhasor([[MY_IMAGE]], 'z')).message).toBe(
      'z holds an image, not a phasor: give a number, text such as 7+j5, or an entity with properties real and imag (or magnitude and angle)',
    );
    expect(expectPhzError(() => readPhasor([[ARRAY]], 'z')).message).toMatch(/^z holds an array data type, not a phasor/);
    expect(expectPhzError(() => readPhasor([[CHARGING]], 'z')).message).toMatch(/^z is TRUE\/FALSE, not a phasor/);
    expect(expectPhzError(() => readPhasor([[SCISSORS]], 'z')).message).toMatch(/^z: cannot read "Scissors"/);
  });
});

describe('number, choice and boolean readers with data-type cells', () => {
  it('reads numbers from number, formatted-number and text data types', () => {
    expect(readNumber(BILL, 'n')).toBe(104.67);
    expect(readNumber([[MY_DATE]], 'n')).toBe(32889);
    expect(readNumber(arrive({ type: 'String', basicValue: '2,5' }), 'n')).toBe(2.5);
    expect(readNumber(EMPTY, 'n', { default: 7 })).toBe(7);
    expect(readNumbers(arrive([[dbl(1)], [CURRENCY], [3]]), 'angle')).toEqual([1, 24, 3]);
  });
  it('refuses other data types for a number, naming the cell and what it holds', () => {
    expect(expectPhzError(() => readNumber(DIV0, 'power_factor')).message).toBe('power_factor holds the error #DIV/0!: fix the cell it comes from first');
    expect(expectPhzError(() => readNumbers([[1], [MY_IMAGE]], 'angle')).message).toBe('angle, row 2 must be a number but is an image: give a plain number');
    expect(expectPhzError(() => readNumber(LLAMA, 'n')).message).toBe('n must be a number but is the entity "A llama": give a plain number');
  });
  it('reads choices and TRUE/FALSE from text and Boolean data types', () => {
    expect(readChoice(arrive({ type: 'String', basicValue: 'RAD' }), 'unit', ['deg', 'rad'], 'deg')).toBe('rad');
    expect(readChoice([[EMPTY]], 'unit', ['deg', 'rad'], 'deg')).toBe('deg');
    expect(readBoolean(CHARGING, 'leading', false)).toBe(true);
    expect(readBoolean([[arrive({ type: 'Boolean', basicValue: false })]], 'leading', true)).toBe(false);
  });
  it('refuses other data types for a choice or a boolean', () => {
    expect(expectPhzError(() => readChoice(MY_IMAGE, 'unit', ['deg', 'rad'], 'deg')).message).toBe(
      'unit is an image, not one of the words "deg", "rad": use one of those (any case)',
    );
    expect(expectPhzError(() => readChoice(DIV0, 'unit', ['deg', 'rad'], 'deg')).message).toBe('unit holds the error #DIV/0!: fix the cell it comes from first');
    expect(expectPhzError(() => readBoolean(CHAI, 'leading', false)).message).toBe('leading must be TRUE or FALSE but is the linked data type "Chai"');
    expect(expectPhzError(() => readBoolean([[DIV0]], 'leading', false)).message).toMatch(/^leading holds the error #DIV\/0!/);
  });
});

describe('functions given data-type cells', () => {
  it('PHZ.MAG reads an entity phasor; PHZ.ADD reads a pair block of number data types as pairs', () => {
    expectClose(functions.MAG([[feederZ({ real: dbl(3), imag: dbl(4) })]])[0][0] as number, 5);
    // the same result as the plain numbers: (1+j2) + (3+j4)
    expect(functions.ADD([arrive([[dbl(1), dbl(2)], [dbl(3), dbl(4.5)]])])).toEqual(functions.ADD([[[1, 2], [3, 4.5]]]));
  });
  it('PHZ.FROMPOLAR reads formatted numbers and a text data type for the unit', () => {
    const out = functions.FROMPOLAR([[dbl(230, '0 "V"')]], [[dbl(-120)]], arrive({ type: 'String', basicValue: 'deg' }), null);
    expect(out).toEqual(functions.FROMPOLAR([[230]], [[-120]], null, null));
  });
  it('PHZ.NEUTRAL120 still refuses a negative current given as a number data type', () => {
    expect(expectPhzError(() => functions.NEUTRAL120([[dbl(20)], [dbl(-10)], [dbl(10)]], null, null)).message).toMatch(/i1, row 2/);
  });
  it('PHZ.STARLOAD reads the neutral word from a text data type', () => {
    const args = [[['230∠0'], ['230∠-120'], ['230∠120']], [['12+j5'], ['20'], ['8-j6']]];
    expect(functions.STARLOAD(...args, arrive({ type: 'String', basicValue: 'open' }), null, null, null)).toEqual(
      functions.STARLOAD(...args, [['open']], null, null, null),
    );
  });
});
