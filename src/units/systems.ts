/** The unit systems the forms offer first (every value still carries its own unit as typed). Pure: no mathjs. */
export const UNIT_SYSTEMS = ['si', 'us'] as const;
/** 'si': metres, kilograms, seconds; 'us': US customary (feet, inches, pounds). */
export type UnitSystem = (typeof UNIT_SYSTEMS)[number];
