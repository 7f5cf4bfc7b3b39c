import { toDisplay } from './convert';
import type { Quantity, UnitSystem } from './types';
import { findDisplayUnit } from './unit-table';

/** Shown in place of a number that is missing or not finite, so NaN never reaches the screen. */
export const NO_VALUE = '—';

/**
 * Formats an SI value in the chosen units with its unit symbol, separated by a no-break space.
 * @param valueSI value in m, kN, kN/m, kNm, mm or MPa according to `quantity`
 * @param digits decimal places; defaults to a per-unit choice (e.g. 2 for m, 1 for kNm)
 * @example
 * formatQuantity(12.345, 'moment', 'SI') // '12.3 kNm'
 * formatQuantity(3.048, 'length', 'US', 1) // '10.0 ft'
 */
export function formatQuantity(
	valueSI: number,
	quantity: Quantity,
	units: UnitSystem,
	digits?: number
): string {
	const unit = findDisplayUnit(quantity, units);
	const number = formatNumber(toDisplay(valueSI, quantity, units), digits ?? unit.digits);
	return `${number}\u00a0${unit.symbol}`;
}

/**
 * Formats a plain number with fixed decimals; −0 after rounding shows as 0, non-finite as '—'.
 * @example
 * formatNumber(-0.004, 2) // '0.00'
 */
export function formatNumber(value: number, digits: number): string {
	if (!Number.isFinite(value)) return NO_VALUE;
	const text = value.toFixed(Math.max(0, Math.min(10, Math.trunc(digits))));
	return /^-0(\.0*)?$/.test(text) ? text.slice(1) : text;
}
