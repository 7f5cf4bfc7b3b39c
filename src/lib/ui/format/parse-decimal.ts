import type { Parsed } from './types';

// Optional sign, digits, at most one decimal separator (comma or dot), optional exponent.
const DECIMAL = /^[+-]?(\d+([.,]\d*)?|[.,]\d+)([eE][+-]?\d+)?$/;

/**
 * Reads a decimal number typed on a phone keyboard. Accepts a comma or a dot as the decimal
 * separator; rejects thousands separators, units and anything else with a message.
 * @example
 * parseDecimal('2,5') // { ok: true, value: 2.5 }
 * parseDecimal('2.5.1') // { ok: false, message: … }
 */
export function parseDecimal(text: string): Parsed {
	const trimmed = text.trim().replace(/\s+/g, '');
	if (trimmed === '') return { ok: false, message: 'Enter a number.' };
	if (!DECIMAL.test(trimmed)) {
		return {
			ok: false,
			message: `“${text.trim()}” is not a number. Use digits with one decimal comma or point, e.g. 2,5.`
		};
	}
	const value = Number(trimmed.replace(',', '.'));
	if (!Number.isFinite(value)) return { ok: false, message: 'That number is too large.' };
	// Fold −0 into 0 so it never shows as “-0”.
	return { ok: true, value: value === 0 ? 0 : value };
}
