/**
 * Test helper: reads the literal arguments of a documented example formula
 * (`=PHZ.NAME("230∠0", 4, {1;2})`), so tests can move them into cells or pass them
 * straight to the implementation. Only literals are understood: text, numbers,
 * TRUE/FALSE and array constants; anything else is reported as not literal.
 */
export type Literal = string | number | boolean;
export type Arg =
  | { readonly kind: 'scalar'; readonly value: Literal; readonly source: string }
  | { readonly kind: 'array'; readonly rows: Literal[][]; readonly source: string }
  | { readonly kind: 'other'; readonly source: string };

export interface Call {
  readonly name: string;
  readonly args: Arg[];
}

/** Splits at `sep` outside quotes, brackets and braces. */
function splitTop(text: string, sep: string): string[] {
  const parts: string[] = [];
  let depth = 0;
  let quoted = false;
  let start = 0;
  for (let i = 0; i < text.length; i++) {
    const ch = text[i];
    if (quoted) {
      if (ch === '"') {
        if (text[i + 1] === '"') i++;
        else quoted = false;
      }
      continue;
    }
    if (ch === '"') quoted = true;
    else if (ch === '(' || ch === '{') depth++;
    else if (ch === ')' || ch === '}') depth--;
    else if (ch === sep && depth === 0) {
      parts.push(text.slice(start, i));
      start = i + 1;
    }
  }
  parts.push(text.slice(start));
  return parts;
}

function scalarLiteral(text: string): Literal | undefined {
  const t = text.trim();
  if (/^"(?:[^"]|"")*"$/.test(t)) return t.slice(1, -1).replace(/""/g, '"');
  if (/^-?(?:\d+\.?\d*|\.\d+)(?:e[+-]?\d+)?$/i.test(t)) return Number(t);
  if (/^true$/i.test(t)) return true;
  if (/^false$/i.test(t)) return false;
  return undefined;
}

function parseArg(source: string): Arg {
  const t = source.trim();
  if (t.startsWith('{') && t.endsWith('}')) {
    const rows: Literal[][] = [];
    for (const rowText of splitTop(t.slice(1, -1), ';')) {
      const row: Literal[] = [];
      for (const cellText of splitTop(rowText, ',')) {
        const v = scalarLiteral(cellText);
        if (v === undefined) return { kind: 'other', source: t };
        row.push(v);
      }
      rows.push(row);
    }
    return { kind: 'array', rows, source: t };
  }
  const v = scalarLiteral(t);
  return v === undefined ? { kind: 'other', source: t } : { kind: 'scalar', value: v, source: t };
}

/** The top-level call of a formula, or `undefined` when it is not `=PHZ.NAME(...)` alone. */
export function parseCall(formula: string): Call | undefined {
  const m = /^=\s*PHZ\.([A-Z0-9_]+)\s*\(([\s\S]*)\)\s*$/i.exec(formula);
  if (!m) return undefined;
  // The outer brackets must close at the very end (not `=PHZ.A(1)+PHZ.B(2)`).
  const inner = m[2];
  let depth = 0;
  let quoted = false;
  for (const ch of inner) {
    if (quoted) {
      if (ch === '"') quoted = false;
      continue;
    }
    if (ch === '"') quoted = true;
    else if (ch === '(') depth++;
    else if (ch === ')' && --depth < 0) return undefined;
  }
  const args = inner.trim() === '' ? [] : splitTop(inner, ',').map(parseArg);
  return { name: m[1].toUpperCase(), args };
}
