/**
 * Quoting what a person gave inside a message. A message names the value that was wrong, but
 * only an excerpt of it: the advice after it must stay readable, in the cell's tooltip and
 * in Excel, which cuts messages near 255 characters (see `fitHostMessage`). Every message
 * that quotes user input goes through `excerpt`.
 */

/** The longest excerpt of user input a message quotes, in characters. */
export const EXCERPT_LENGTH = 40;

/**
 * `text` when it is short, else its first characters and an ellipsis, never splitting a
 * surrogate pair.
 *
 * @example excerpt('x'.repeat(100000)).length // 40
 */
export function excerpt(text: string, max = EXCERPT_LENGTH): string {
  if (text.length <= max) return text;
  let end = max - 1;
  const code = text.charCodeAt(end - 1);
  if (code >= 0xd800 && code <= 0xdbff) end--;
  return `${text.slice(0, end)}…`;
}

/** `"text"`, excerpted. */
export function quoted(text: string, max = EXCERPT_LENGTH): string {
  return `"${excerpt(text, max)}"`;
}

/**
 * A long text cut in the middle: its start and its end kept, so a message whose advice
 * comes last keeps the advice. `max` counts the ellipsis.
 *
 * @example clipMiddle('a'.repeat(300) + ': give a number', 60).endsWith(': give a number') // true
 */
export function clipMiddle(text: string, max: number): string {
  if (text.length <= max) return text;
  const tail = Math.floor((max - 1) * 0.6);
  let head = max - 1 - tail;
  let start = text.length - tail;
  if (isLowSurrogate(text.charCodeAt(start))) start++;
  if (isHighSurrogate(text.charCodeAt(head - 1))) head--;
  return `${text.slice(0, head)}…${text.slice(start)}`;
}

function isHighSurrogate(code: number): boolean {
  return code >= 0xd800 && code <= 0xdbff;
}

function isLowSurrogate(code: number): boolean {
  return code >= 0xdc00 && code <= 0xdfff;
}
