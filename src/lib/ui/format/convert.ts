import { parseDecimal } from './parse-decimal';
import type { Parsed, Quantity, UnitSystem } from './types';
import { findDisplayUnit } from './unit-table';

/**
 * Converts a stored SI value (m, kN, kN/m, kNm, mm, MPa) into the chosen display unit.
 * @example
 * toDisplay(0.3048, 'length', 'US') // 1 (ft)
 */
export function toDisplay(valueSI: number, quantity: Quantity, units: UnitSystem): number {
	return valueSI / findDisplayUnit(quantity, units).toSI;
}

/**
 * Reads a typed value in the chosen display unit and returns it in SI (m, kN, kN/m, kNm, mm,
 * MPa). A comma or a dot may be the decimal separator; junk comes back with a message.
 * @example
 * fromDisplay('2,5', 'dimension', 'US') // { ok: true, value: 63.5 } (mm)
 */
export function fromDisplay(text: string, quantity: Quantity, units: UnitSystem): Parsed {
	const parsed = parseDecimal(text);
	if (!parsed.ok) return parsed;
	const value = parsed.value * findDisplayUnit(quantity, units).toSI;
	if (!Number.isFinite(value)) return { ok: false, message: 'That number is too large.' };
	return { ok: true, value };
}
