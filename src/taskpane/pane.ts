/**
 * The task pane UI: a searchable reference of every PHZ function with an Insert button
 * that writes the function's example formula into the active cell through a
 * WorkbookPort. Touches no Office global, so the preview mounts it with its own port.
 */
import paneCss from './pane.css?raw';
import { specs as registrySpecs } from '../functions/index';
import type { FunctionSpec } from '../functions/spec';
import type { WorkbookPort } from './port';
import { buildReference, countEntries, type ReferenceEntry, type ReferenceExample } from './reference';
import { paneParts, type PanePart, type PartHandle } from './parts';
import { builder, ensureStyle } from './dom';

const STYLE_ID = 'starpoint-pane-style';

export interface PaneHandle {
  /** The pane's outer element (inside `root`). */
  readonly element: HTMLElement;
  /** Sets the search text and filters the reference, as if typed. */
  search(query: string): void;
  /** Shows a tab: `reference` or a part's id. */
  showTab(id: string): void;
  /** Empties `root`. */
  unmount(): void;
}

export interface PaneOptions {
  /** The functions to list; defaults to the project registry. */
  readonly specs?: readonly FunctionSpec[];
  /** The parts beside the reference; defaults to `paneParts`. */
  readonly parts?: readonly PanePart[];
}

let mountCount = 0;

/** Mounts the pane into `root` (replacing its content). `port` null: reference only. */
export function mountPane(root: HTMLElement, port: WorkbookPort | null, options: PaneOptions = {}): PaneHandle {
  const doc = root.ownerDocument;
  const h = builder(doc);
  const specs = options.specs ?? registrySpecs;
  const id = `sp${++mountCount}`;
  ensureStyle(doc, STYLE_ID, paneCss);

  const searchInput = h('input', {
    className: 'sp-search',
    attrs: { id: `${id}-search`, type: 'search', autocomplete: 'off', spellcheck: 'false', placeholder: 'name or word, e.g. neutral' },
  });
  const count = h('p', { className: 'sp-count', attrs: { id: `${id}-count`, 'aria-live': 'polite' } });
  const list = h('div', { className: 'sp-list' });
  const noPortNote = port
    ? null
    : h('p', {
        className: 'sp-note',
        attrs: { id: `${id}-noport` },
        text: 'Inserting needs a workbook: open this pane from Excel or in the preview workbook. The reference below works everywhere.',
      });

  function renderExample(ex: ReferenceExample): HTMLElement {
    const single = ex.rows.length === 1 && ex.rows[0].length === 1;
    const result = single
      ? h('code', { className: 'sp-result', text: ex.rows[0][0] })
      : h(
          'table',
          { className: 'sp-result-grid' },
          h('caption', { className: 'sp-visually-hidden', text: `Result of ${ex.formula}` }),
          h('tbody', {}, ...ex.rows.map((row) => h('tr', {}, ...row.map((cell) => h('td', { text: cell }))))),
        );
    return h(
      'div',
      { className: 'sp-example' },
      h('code', { className: 'sp-formula', text: ex.formula }),
      h('span', { className: 'sp-gives', text: single ? ' gives ' : ' spills ' }),
      result,
    );
  }

  async function insert(entry: ReferenceEntry, status: HTMLElement, button: HTMLButtonElement): Promise<void> {
    if (!port) return;
    button.disabled = true;
    status.textContent = 'Inserting…';
    try {
      const result = await port.insertIntoEmptyActiveCell(entry.starter);
      const where = `${result.sheet}!${result.address}`;
      status.textContent = result.written
        ? `Inserted ${entry.starter} into ${where}. Edit its arguments to use your own cells.`
        : `${where} is not empty, so nothing was written. Select an empty cell and try again.`;
    } catch (e) {
      status.textContent = `Could not insert into the ${port.hostName} workbook: ${e instanceof Error ? e.message : String(e)}`;
    } finally {
      button.disabled = false;
    }
  }

  function renderEntry(entry: ReferenceEntry): HTMLElement {
    const headingId = `${id}-fn-${entry.name}`;
    const status = h('p', { className: 'sp-status', attrs: { role: 'status' } });
    const button = h('button', {
      className: 'sp-insert',
      text: 'Insert',
      attrs: {
        type: 'button',
        'aria-label': `Insert ${entry.starter} into the active cell`,
        ...(port ? {} : { 'aria-describedby': `${id}-noport` }),
      },
    });
    if (port) button.addEventListener('click', () => void insert(entry, status, button));
    else button.disabled = true;

    const params =
      entry.params.length === 0
        ? h('p', { text: 'No arguments.' })
        : h(
            'dl',
            { className: 'sp-params' },
            ...entry.params.flatMap((p) => [
              h(
                'dt',
                {},
                h('code', { text: p.name }),
                p.optional ? h('span', { className: 'sp-tag', text: 'optional' }) : null,
                p.repeating ? h('span', { className: 'sp-tag', text: 'repeats' }) : null,
              ),
              h('dd', { text: p.description }),
            ]),
          );

    return h(
      'article',
      { className: 'sp-fn', attrs: { 'aria-labelledby': headingId, 'data-function': entry.name } },
      h('h3', { attrs: { id: headingId } }, h('code', { text: entry.call })),
      h('p', { className: 'sp-summary', text: entry.summary }),
      entry.details ? h('p', { className: 'sp-details', text: entry.details }) : null,
      h('h4', { text: 'Arguments' }),
      params,
      h('h4', { text: 'Result' }),
      h('p', { text: entry.result }),
      entry.examples.length > 0 ? h('h4', { text: entry.examples.length > 1 ? 'Examples' : 'Example' }) : null,
      ...entry.examples.map(renderExample),
      entry.errors.length > 0 ? h('h4', { text: 'Errors' }) : null,
      entry.errors.length > 0 ? h('ul', { className: 'sp-errors' }, ...entry.errors.map((e) => h('li', { text: e }))) : null,
      entry.cautions.length > 0
        ? h(
            'div',
            { className: 'sp-cautions', attrs: { role: 'note' } },
            h('h4', { text: 'Caution' }),
            h('ul', {}, ...entry.cautions.map((c) => h('li', { text: c }))),
          )
        : null,
      h('div', { className: 'sp-actions' }, button, status),
    );
  }

  function render(query: string): void {
    const groups = buildReference(specs, query);
    const shown = countEntries(groups);
    const q = query.trim();
    count.textContent =
      q === ''
        ? `${specs.length} functions.`
        : shown === 0
          ? `No function matches “${q}”.`
          : `${shown} of ${specs.length} functions match “${q}”.`;
    list.replaceChildren(
      ...groups.map((g) => {
        const headingId = `${id}-group-${g.group}`;
        return h(
          'section',
          { className: 'sp-group', attrs: { 'aria-labelledby': headingId } },
          h('h2', { attrs: { id: headingId }, text: g.title }),
          ...g.entries.map(renderEntry),
        );
      }),
    );
  }

  const referencePanel = h(
    'div',
    { className: 'sp-panel', attrs: { 'data-part': 'reference' } },
    h(
      'div',
      { className: 'sp-searchbar', attrs: { role: 'search' } },
      h('label', { attrs: { for: `${id}-search` }, text: 'Search functions' }),
      searchInput,
      count,
    ),
    noPortNote,
    list,
  );

  // Tabs (WAI-ARIA tabs pattern): the reference first, then each part, mounted when first shown.
  const parts = options.parts ?? paneParts;
  const tabs: Array<{ id: string; label: string; panel: HTMLElement; part?: PanePart; handle?: PartHandle | void; mounted: boolean }> = [
    { id: 'reference', label: 'Functions', panel: referencePanel, mounted: true },
    ...parts.map((part) => ({
      id: part.id,
      label: part.label,
      part,
      panel: h('div', { className: 'sp-panel', attrs: { 'data-part': part.id } }),
      mounted: false,
    })),
  ];
  const tabButtons = tabs.map((t) =>
    h('button', {
      className: 'sp-tab',
      text: t.label,
      attrs: { type: 'button', role: 'tab', id: `${id}-tab-${t.id}`, 'aria-controls': `${id}-panel-${t.id}`, 'data-tab': t.id },
    }),
  );
  tabs.forEach((t) => {
    t.panel.id = `${id}-panel-${t.id}`;
    if (parts.length > 0) {
      t.panel.setAttribute('role', 'tabpanel');
      t.panel.setAttribute('aria-labelledby', `${id}-tab-${t.id}`);
    }
  });
  let current = -1;
  function select(index: number, focus = false): void {
    if (index === current) return;
    const before = tabs[current];
    if (before) before.handle?.hide?.();
    current = index;
    tabs.forEach((t, i) => {
      const on = i === index;
      t.panel.hidden = !on;
      tabButtons[i].setAttribute('aria-selected', String(on));
      tabButtons[i].tabIndex = on ? 0 : -1;
    });
    const t = tabs[index];
    if (!t.mounted && t.part) {
      t.mounted = true;
      t.handle = t.part.mount(t.panel, port);
    }
    t.handle?.show?.();
    if (focus) tabButtons[index].focus();
  }
  tabButtons.forEach((b, i) => {
    b.addEventListener('click', () => select(i));
    b.addEventListener('keydown', (ev) => {
      const n = tabs.length;
      const to = ev.key === 'ArrowRight' ? (i + 1) % n : ev.key === 'ArrowLeft' ? (i + n - 1) % n : ev.key === 'Home' ? 0 : ev.key === 'End' ? n - 1 : -1;
      if (to >= 0) {
        ev.preventDefault();
        select(to, true);
      }
    });
  });
  const tabBar = parts.length > 0 ? h('div', { className: 'sp-tabs', attrs: { role: 'tablist', 'aria-label': 'Starpoint' } }, ...tabButtons) : null;

  const element = h(
    'div',
    { className: 'sp-pane' },
    h(
      'header',
      { className: 'sp-header' },
      h('h1', { text: 'Starpoint phasors' }),
      h('p', { text: 'Phasor and three-phase functions for your cells, in the PHZ namespace.' }),
    ),
    tabBar,
    ...tabs.map((t) => t.panel),
    h(
      'footer',
      { className: 'sp-footer', attrs: { role: 'note' } },
      h('h2', { text: 'Before you rely on a result' }),
      h(
        'p',
        {
          text:
            'Results are only as good as the inputs and the model: fundamental-frequency phasors and linear loads unless harmonics are given. ' +
            'Conductor sizing, protection and neutral arrangements follow the wiring rules adopted where you work and must be checked by a competent, licensed person. ' +
            'Work on live systems is for qualified people only.',
        },
      ),
    ),
  );

  searchInput.addEventListener('input', () => render(searchInput.value));
  render('');
  select(0);
  root.replaceChildren(element);

  return {
    element,
    search(query: string) {
      searchInput.value = query;
      render(query);
    },
    showTab(tabId: string) {
      const index = tabs.findIndex((t) => t.id === tabId);
      if (index < 0) throw new Error(`no pane tab "${tabId}"; tabs are ${tabs.map((t) => t.id).join(', ')}`);
      select(index);
    },
    unmount() {
      for (const t of tabs) t.handle?.dispose?.();
      root.replaceChildren();
    },
  };
}
