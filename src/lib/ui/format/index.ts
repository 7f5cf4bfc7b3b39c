export type { Parsed, Quantity, UnitSystem } from './types';
export type { DisplayUnit } from './unit-table';
export { DISPLAY_UNITS, findDisplayUnit } from './unit-table';
export { parseDecimal } from './parse-decimal';
export { fromDisplay, toDisplay } from './convert';
export { formatNumber, formatQuantity, NO_VALUE } from './format-quantity';
export { formatUtilisation } from './format-utilisation';
