/** The unit system chosen in settings. Stored values stay SI whatever the choice. */
export type UnitSystem = 'SI' | 'US';

/**
 * A kind of quantity shown in the UI. SI units: length m, force kN, lineLoad kN/m, moment kNm,
 * dimension mm, stress MPa (the case-file units plus mm and MPa for sections and steel).
 */
export type Quantity = 'length' | 'force' | 'lineLoad' | 'moment' | 'dimension' | 'stress';

/** Outcome of reading a number typed by the user. */
export type Parsed = { ok: true; value: number } | { ok: false; message: string };
