/** The worked-sheet calculations, in the order the pane's chooser lists them. */
import type { Calculation } from './calculation';
import { starNeutral } from './star-neutral';
import { starOpen } from './star-open';
import { starPower } from './star-power';
import { delta } from './delta';
import { unbalance } from './unbalance';
import { neutralHarmonics } from './neutral-harmonics';
import { panelSchedule } from './panel-schedule';

export const calculations: readonly Calculation[] = [starNeutral, starOpen, starPower, delta, unbalance, neutralHarmonics, panelSchedule];

export function calculationById(id: string): Calculation {
  const c = calculations.find((x) => x.id === id);
  if (!c) throw new Error(`no worked-sheet calculation "${id}"; there are ${calculations.map((x) => x.id).join(', ')}`);
  return c;
}
