/**
 * The pane's small DOM helpers, shared by the reference and every part: an element builder
 * bound to a document (no global `document`, so the pane mounts into any page), a
 * stylesheet added once per document, and the text of a caught error.
 */

export type Child = Node | string | null | undefined | false;

export interface ElementProps {
  readonly className?: string;
  readonly text?: string;
  readonly attrs?: Record<string, string>;
}

/** An element builder for `doc`: `h('p', { className, text, attrs }, ...children)`; falsy children are skipped. */
export function builder(doc: Document) {
  return function h<K extends keyof HTMLElementTagNameMap>(tag: K, props: ElementProps = {}, ...children: Child[]): HTMLElementTagNameMap[K] {
    const el = doc.createElement(tag);
    if (props.className) el.className = props.className;
    if (props.text !== undefined) el.textContent = props.text;
    for (const [k, v] of Object.entries(props.attrs ?? {})) el.setAttribute(k, v);
    for (const c of children) if (c !== null && c !== undefined && c !== false) el.append(c);
    return el;
  };
}

/** Adds `css` to `doc` as a <style> element with `id`, once. */
export function ensureStyle(doc: Document, id: string, css: string): void {
  if (doc.getElementById(id)) return;
  const style = doc.createElement('style');
  style.id = id;
  style.textContent = css;
  doc.head.append(style);
}

/** The text of a caught error, for a status line. */
export function errorText(e: unknown): string {
  return e instanceof Error ? e.message : String(e);
}
