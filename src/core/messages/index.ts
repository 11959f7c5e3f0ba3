/**
 * The message catalogue: every message an engineer can see, in one place, one module
 * per area. Messages say what was wrong, which argument, and what to do.
 */
export { parseMessages } from './parse';
export { readerMessages } from './readers';
export { valueMessages } from './values';
export { threePhaseMessages } from './threephase';
export { plotMessages } from './plot';
export { workbookMessages } from './workbook';
export { clipMiddle, excerpt, quoted, EXCERPT_LENGTH } from './quote';
export { feederMessages } from './feeders';
