/** The cautions shown beside the neutral sizing functions (DESIGN §8). */
export const SIZING_CAUTIONS: readonly string[] = [
  'Results inform design; they do not replace it. They depend on the inputs and the model (fundamental-frequency phasors, and the harmonic contents you give).',
  'Conductor sizing, protection and neutral arrangements follow the locally adopted wiring rules and must be checked by a competent, licensed person.',
  'Work on live systems is for qualified people only.',
];
