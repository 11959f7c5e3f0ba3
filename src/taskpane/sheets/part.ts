/**
 * The pane's "Worked sheet" part: choose a calculation, adjust its inputs (prefilled with
 * the demo scenario, checked as you type with the functions' own readers and messages),
 * read inputs from the selection, and write the calculation as a new sheet through the
 * WorkbookPort. Touches no Office global.
 */
import partCss from './part.css?raw';
import type { PanePart, PartHandle } from '../parts';
import type { WorkbookPort } from '../port';
import type { Calculation, FieldSpec, FieldValue } from './calculation';
import { readField } from './calculation';
import { calculationById, calculations } from './calculations';
import { cellA1 } from './plan';
import { ensureStyle, errorText } from '../dom';

const STYLE_ID = 'starpoint-sheets-style';
/** "Read from selection" reads at most this many cells: more than any calculation has fields. */
const SELECTION_LIMIT = 200;

/** Today as `YYYY-MM-DD` in local time. */
export function today(d = new Date()): string {
  const two = (n: number) => String(n).padStart(2, '0');
  return `${d.getFullYear()}-${two(d.getMonth() + 1)}-${two(d.getDate())}`;
}

let mounts = 0;

function mount(panel: HTMLElement, port: WorkbookPort | null): PartHandle {
  const doc = panel.ownerDocument;
  ensureStyle(doc, STYLE_ID, partCss);
  const id = `sps${++mounts}`;
  const el = <K extends keyof HTMLElementTagNameMap>(tag: K, className = '', text?: string): HTMLElementTagNameMap[K] => {
    const e = doc.createElement(tag);
    if (className) e.className = className;
    if (text !== undefined) e.textContent = text;
    return e;
  };

  const chooserLabel = el('label', 'sps-label', 'Calculation');
  chooserLabel.htmlFor = `${id}-calc`;
  const chooser = el('select', 'sps-select');
  chooser.id = `${id}-calc`;
  for (const c of calculations) {
    const o = el('option', '', c.name);
    o.value = c.id;
    chooser.append(o);
  }
  const summary = el('p', 'sps-summary');
  const scenarioLabel = el('label', 'sps-label', 'Scenario note (written on the sheet, editable there)');
  scenarioLabel.htmlFor = `${id}-scenario`;
  const scenario = el('input', 'sps-input sps-scenario');
  scenario.id = `${id}-scenario`;
  scenario.type = 'text';
  const form = el('div', 'sps-fields');
  const blocker = el('p', 'sps-blocker');
  blocker.id = `${id}-blocker`;
  const caseProblem = el('p', 'sps-case');
  caseProblem.setAttribute('role', 'alert');
  caseProblem.id = `${id}-case`;

  const readButton = el('button', 'sps-button', 'Read from selection');
  readButton.type = 'button';
  const demoButton = el('button', 'sps-button', 'Demo values');
  demoButton.type = 'button';
  const writeButton = el('button', 'sps-button sps-primary', 'Write sheet');
  writeButton.type = 'button';
  const status = el('p', 'sps-status');
  status.setAttribute('role', 'status');
  status.setAttribute('aria-live', 'polite');
  const blocked = port ? (port.sheetWritingBlocked?.() ?? (port.writeSheetPlan ? null : `${port.hostName} cannot write worked sheets.`)) : null;
  const note = el(
    'p',
    'sps-note',
    port
      ? blocked
        ? `Writing sheets is not available here: ${blocked}`
        : 'Writes a new sheet; never changes an existing sheet or cell.'
      : 'Writing a sheet needs a workbook: open this pane from Excel or in the preview workbook. You can still fill and check the inputs.',
  );
  note.id = `${id}-note`;
  const actions = el('div', 'sps-actions');
  actions.append(...(port ? [readButton] : []), demoButton, writeButton);

  panel.replaceChildren(
    el('h2', '', 'Worked sheet'),
    el('p', 'sps-intro', 'Writes a live calculation sheet: inputs, numbered steps with their formulas, checks and cautions. Change an input on the sheet and everything recalculates.'),
    chooserLabel,
    chooser,
    summary,
    scenarioLabel,
    scenario,
    form,
    caseProblem,
    note,
    blocker,
    actions,
    status,
  );

  let calc: Calculation = calculations[0];
  let inputs: Array<{ spec: FieldSpec; input: HTMLInputElement; error: HTMLElement }> = [];
  let lastFocused = 0;
  let busy = false;

  /** Reads one field, shows its message; returns the value or undefined. */
  function checkField(i: number): FieldValue | undefined {
    const { spec, input, error } = inputs[i];
    try {
      const v = readField(spec, input.value);
      error.textContent = '';
      input.removeAttribute('aria-invalid');
      return v;
    } catch (e) {
      error.textContent = errorText(e);
      input.setAttribute('aria-invalid', 'true');
      return undefined;
    }
  }

  /** Reads all fields and the whole case; enables writing only when everything reads. */
  function refresh(): Record<string, FieldValue> | undefined {
    const values: Record<string, FieldValue> = {};
    let ok = true;
    const bad: string[] = [];
    inputs.forEach((f, i) => {
      const v = checkField(i);
      if (v === undefined) {
        ok = false;
        bad.push(f.spec.id);
      } else values[f.spec.id] = v;
    });
    blocker.textContent = bad.length > 0 ? `Fix ${bad.join(', ')} (marked in red) to write the sheet.` : '';
    caseProblem.textContent = '';
    if (ok) {
      try {
        calc.crossCheck(values);
      } catch (e) {
        caseProblem.textContent = `These inputs have no solution: ${errorText(e)}`;
        ok = false;
      }
    }
    writeButton.disabled = busy || !ok || !port || blocked !== null;
    return ok ? values : undefined;
  }

  function show(calcId: string): void {
    calc = calculationById(calcId);
    chooser.value = calc.id;
    summary.textContent = calc.summary;
    scenario.value = calc.demoScenario;
    inputs = [];
    const groups = new Map<string, HTMLFieldSetElement>();
    form.replaceChildren();
    calc.fields.forEach((spec, i) => {
      let set = groups.get(spec.group);
      if (!set) {
        set = el('fieldset', 'sps-group');
        set.append(el('legend', '', spec.group));
        groups.set(spec.group, set);
        form.append(set);
      }
      const fieldId = `${id}-f-${spec.id}`;
      const label = el('label', 'sps-field-label');
      label.htmlFor = fieldId;
      label.append(el('span', 'sps-symbol', spec.id), doc.createTextNode(` ${spec.label}${spec.unit ? `, ${spec.unit}` : ''}`));
      const input = el('input', 'sps-input');
      input.id = fieldId;
      input.type = 'text';
      input.autocomplete = 'off';
      input.spellcheck = false;
      input.value = spec.demo;
      input.dataset.field = spec.id;
      const error = el('span', 'sps-error');
      error.id = `${fieldId}-error`;
      input.setAttribute('aria-describedby', error.id);
      input.addEventListener('input', () => refresh());
      input.addEventListener('focus', () => {
        lastFocused = i;
      });
      const row = el('div', 'sps-field');
      row.append(label, input, error);
      set.append(row);
      inputs.push({ spec, input, error });
    });
    lastFocused = 0;
    status.textContent = '';
    refresh();
  }

  async function readSelection(): Promise<void> {
    if (!port) return;
    try {
      const sel = await port.readSelection(SELECTION_LIMIT);
      if (sel.cellCount > SELECTION_LIMIT) {
        status.textContent = `${sel.sheet}!${sel.selected} has ${sel.cellCount} cells; select at most ${SELECTION_LIMIT} input cells and try again.`;
        return;
      }
      // values as the cells show them; blanks, TRUE/FALSE and error cells are not inputs
      const cells = sel.values.flat().filter((v): v is string | number => (typeof v === 'string' && v !== '') || typeof v === 'number');
      if (cells.length === 0) {
        status.textContent = `${sel.sheet}!${sel.selected} holds no values to read. Select the cells with the inputs, then try again.`;
        return;
      }
      const start = lastFocused;
      const filled: string[] = [];
      for (let k = 0; k < cells.length && start + k < inputs.length; k++) {
        inputs[start + k].input.value = String(cells[k]);
        filled.push(inputs[start + k].spec.id);
      }
      const left = cells.length - filled.length;
      refresh();
      status.textContent =
        `Filled ${filled.join(', ')} from ${sel.sheet}!${sel.selected}, in order from ${filled[0]}.` +
        (left > 0 ? ` ${left} value${left === 1 ? ' was' : 's were'} left over: there are no more fields.` : '') +
        ' Click a field first to start filling there.';
    } catch (e) {
      status.textContent = `Could not read the selection: ${errorText(e)}`;
    }
  }

  async function write(): Promise<void> {
    const values = refresh();
    if (!values || !port?.writeSheetPlan) return;
    busy = true;
    writeButton.disabled = true;
    status.textContent = 'Writing…';
    try {
      const plan = calc.plan(values, { scenario: scenario.value.trim(), date: today() });
      const result = await port.writeSheetPlan(plan);
      let chartText = `The phasor chart's place is kept at ${cellA1(plan.chartArea.top, plan.chartArea.left)}.`;
      const chartBlocked = port.plotSupport().chart;
      if (chartBlocked) {
        chartText = `No phasor chart: ${chartBlocked} Its place is kept at ${cellA1(plan.chartArea.top, plan.chartArea.left)}.`;
      } else {
        try {
          const chart = await port.insertPhasorChart({ ...plan.chart, sheet: result.sheet });
          chartText = `Inserted the linked chart “${chart.chartName}”; its helper cells are ${chart.helperRange}.`;
        } catch (e) {
          chartText = `The phasor chart could not be inserted (${errorText(e)}); its place is kept at ${cellA1(plan.chartArea.top, plan.chartArea.left)}.`;
        }
      }
      status.textContent =
        `Wrote the new sheet “${result.sheet}” (now active): ${plan.inputs.length} inputs, ${plan.steps.length} steps, ${plan.checks.length} checks; ` +
        `${result.cells} cells and ${result.names} names scoped to the sheet. ${chartText}`;
    } catch (e) {
      status.textContent = `Nothing was written: ${errorText(e)}`;
    } finally {
      busy = false;
      refresh();
    }
  }

  chooser.addEventListener('change', () => show(chooser.value));
  demoButton.addEventListener('click', () => show(calc.id));
  readButton.addEventListener('click', () => void readSelection());
  writeButton.addEventListener('click', () => void write());
  if (!port || blocked) writeButton.setAttribute('aria-describedby', note.id);
  show(calculations[0].id);
  return {};
}

export const sheetsPart: PanePart = { id: 'sheets', label: 'Worked sheet', mount };
