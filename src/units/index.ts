/** Units at the edge of the app and the command line: reading typed quantities and showing SI values. */
export { DIMENSIONS, describeExponents, matchesDimension } from './dimensions';
export type { Dimension, DimensionInfo, UnitSystem } from './dimensions';
export { parseQuantity, parseQuantityList, splitList, normaliseText } from './parse';
export type { QuantityOptions, QuantityResult, QuantityListResult } from './parse';
export { ENTRY_RELATIVE_TOLERANCE, defaultUnit, formatForEntry, formatNumber, formatQuantity, unitFactor, unitLabel } from './format';
export { echoQuantity, unitTypedIn } from './echo';
export type { FieldUnits } from './echo';
