/**
 * The drawing as SVG text: self-contained (styles as attributes, no external font or
 * image), so the same text is shown in the pane, saved as an .svg file and drawn onto a
 * canvas for the PNG. Every drawn phasor is a `<g>` carrying `data-label`, `data-magnitude`
 * and `data-angle` (degrees), with its tooltip as an SVG `<title>`.
 */
import type { Arrow, Drawing, TextItem } from './geometry';
import type { MarkerShape } from './palette';

const FONT = "font-family=\"system-ui, -apple-system, 'Segoe UI', Roboto, Arial, sans-serif\"";

/** Escapes text for XML content and attribute values. */
export function xml(text: string): string {
  return text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
}

/** Two decimals are finer than a screen pixel at any zoom the pane offers. */
function n(v: number): string {
  const r = Math.round(v * 100) / 100;
  return Object.is(r, -0) ? '0' : String(r);
}

function text(t: TextItem, attrs: string): string {
  return `<text x="${n(t.x)}" y="${n(t.y)}" text-anchor="${t.anchor}" ${attrs}>${xml(t.text)}</text>`;
}

/** A marker shape centred at (x, y), size `s`. */
export function markerPath(shape: MarkerShape, x: number, y: number, s: number, colour: string): string {
  const h = s / 2;
  switch (shape) {
    case 'circle':
      return `<circle cx="${n(x)}" cy="${n(y)}" r="${n(h)}" fill="${colour}"/>`;
    case 'square':
      return `<rect x="${n(x - h * 0.9)}" y="${n(y - h * 0.9)}" width="${n(s * 0.9)}" height="${n(s * 0.9)}" fill="${colour}"/>`;
    case 'triangle':
      return `<polygon points="${n(x)},${n(y - h)} ${n(x + h)},${n(y + h * 0.8)} ${n(x - h)},${n(y + h * 0.8)}" fill="${colour}"/>`;
    case 'down':
      return `<polygon points="${n(x)},${n(y + h)} ${n(x + h)},${n(y - h * 0.8)} ${n(x - h)},${n(y - h * 0.8)}" fill="${colour}"/>`;
    case 'diamond':
      return `<polygon points="${n(x)},${n(y - h)} ${n(x + h)},${n(y)} ${n(x)},${n(y + h)} ${n(x - h)},${n(y)}" fill="${colour}"/>`;
    case 'cross':
      return `<path d="M${n(x - h)},${n(y - h)}L${n(x + h)},${n(y + h)}M${n(x - h)},${n(y + h)}L${n(x + h)},${n(y - h)}" stroke="${colour}" stroke-width="2.2" fill="none"/>`;
  }
}

function arrowSvg(a: Arrow): string {
  const dash = a.dash ? ` stroke-dasharray="${a.dash}"` : '';
  const ghost = a.role === 'ghost' ? ' opacity="0.35"' : '';
  const hollow = a.role === 'sum';
  const head = a.head.map(([x, y]) => `${n(x)},${n(y)}`).join(' ');
  const cell = a.cell ? ` data-cell="${xml(a.cell)}"` : '';
  return (
    `<g class="phasor" data-role="${a.role}" data-label="${xml(a.label)}" data-magnitude="${a.magnitude}" data-angle="${a.angleDeg}" data-group="${a.group}"${cell}${ghost}>` +
    `<title>${xml(a.tooltip)}</title>` +
    // a wide transparent line makes thin arrows easy to point at for the tooltip
    `<line x1="${n(a.x1)}" y1="${n(a.y1)}" x2="${n(a.x2)}" y2="${n(a.y2)}" stroke="transparent" stroke-width="10"/>` +
    `<line x1="${n(a.x1)}" y1="${n(a.y1)}" x2="${n(a.sx)}" y2="${n(a.sy)}" stroke="${a.colour}" stroke-width="${a.width}" stroke-linecap="butt"${dash}/>` +
    `<polygon points="${head}" fill="${hollow ? '#ffffff' : a.colour}" stroke="${a.colour}" stroke-width="${hollow ? 2 : 1}" stroke-linejoin="round"/>` +
    `</g>`
  );
}

/** The SVG document of a drawing (no XML prolog: it is inlined in the pane too). */
export function renderSvg(d: Drawing): string {
  const id = d.idPrefix;
  const out: string[] = [];
  out.push(
    `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${d.width} ${d.height}" width="${d.width}" height="${d.height}" role="img" aria-labelledby="${id}-title ${id}-desc" class="phz-plot" data-view="${d.view}">`,
    `<title id="${id}-title">${xml(d.title)}</title>`,
    `<desc id="${id}-desc">${xml(d.desc)}</desc>`,
    `<rect x="0" y="0" width="${d.width}" height="${d.height}" fill="#ffffff"/>`,
  );
  // Grid: rings, spokes every 30°, the axes a little darker.
  out.push(`<g class="grid" fill="none" stroke="#c9ced6" stroke-width="1">`);
  for (const r of d.rings) out.push(`<circle cx="${n(d.cx)}" cy="${n(d.cy)}" r="${n(r.r)}"/>`);
  for (const s of d.spokes) {
    const axis = s.angleDeg % 90 === 0;
    out.push(`<line x1="${n(d.cx)}" y1="${n(d.cy)}" x2="${n(s.x2)}" y2="${n(s.y2)}"${axis ? ' stroke="#8a929e"' : ''}/>`);
  }
  out.push(`</g>`);
  out.push(`<g class="spoke-labels" ${FONT} font-size="11" fill="#4a5058">`);
  for (const s of d.spokes) out.push(text({ text: s.label, x: s.lx, y: s.ly, anchor: s.anchor }, ''));
  for (const t of d.axisLabels) out.push(text(t, 'font-style="italic"'));
  out.push(`</g>`);
  out.push(`<g class="ring-labels" ${FONT} font-size="11" fill="#2d3238">`);
  for (const t of d.ringLabels) if (t.text) out.push(text(t, 'paint-order="stroke" stroke="#ffffff" stroke-width="3"'));
  out.push(`</g>`);
  // Ghosts first, then phasors, the chain and the sum on top.
  const order = { ghost: 0, phasor: 1, chain: 2, sum: 3 } as const;
  const arrows = [...d.arrows].sort((a, b) => order[a.role] - order[b.role]);
  out.push(`<g class="phasors">`);
  for (const a of arrows) out.push(arrowSvg(a));
  out.push(`</g>`);
  out.push(`<g class="labels" ${FONT} font-size="12">`);
  for (const l of d.labels) {
    if (l.leader) {
      out.push(`<line x1="${n(l.leader.x1)}" y1="${n(l.leader.y1)}" x2="${n(l.leader.x2)}" y2="${n(l.leader.y2)}" stroke="${l.colour}" stroke-width="0.8" opacity="0.7"/>`);
    }
    out.push(markerPath(l.marker, l.markerX, (l.box.top + l.box.bottom) / 2, 8, l.colour));
    out.push(text(l, `fill="${l.colour}" paint-order="stroke" stroke="#ffffff" stroke-width="3"`));
  }
  out.push(`</g>`);
  out.push(`<g class="legend" ${FONT} font-size="12" fill="#1d2125">`);
  for (const row of d.legend) {
    const dash = row.dash ? ` stroke-dasharray="${row.dash}"` : '';
    out.push(`<line x1="10" y1="${n(row.y + 8)}" x2="46" y2="${n(row.y + 8)}" stroke="${row.colour}" stroke-width="${row.width}"${dash}/>`);
    out.push(`<text x="54" y="${n(row.y + 12)}">${xml(row.text)}</text>`);
  }
  for (const t of d.notes) out.push(text(t, 'fill="#4a5058" font-style="italic"'));
  out.push(`</g>`);
  out.push(`</svg>`);
  return out.join('');
}
