import { fromDisplay, parseDecimal, toDisplay, type Parsed, type UnitSystem } from '$lib/ui/format';
import { BLANK } from './blank-value';
import { checkRule, type FieldInfo } from './field-kinds';

/**
 * The text an untouched field shows for a stored SI value: display units, at most four decimals,
 * no trailing zeros (editing text, not a formatted result).
 * @example
 * formatFieldValue(6, 'length', 'US') // '19.685'
 */
export function formatFieldValue(valueSI: unknown, info: FieldInfo, units: UnitSystem): string {
	if (typeof valueSI !== 'number' || !Number.isFinite(valueSI)) return '';
	const shown = info.kind === 'ratio' ? valueSI : toDisplay(valueSI, info.kind, units);
	const rounded = Math.round(shown * 1e4) / 1e4;
	return String(rounded === 0 ? 0 : rounded);
}

/**
 * Reads what was typed into a field: comma or dot decimals, display units in, SI out, and the
 * field's rule (e.g. a span must be more than zero).
 * @example
 * parseFieldText('4,8', { kind: 'length', rule: 'positive' }, 'SI') // { ok: true, value: 4.8 }
 */
export function parseFieldText(text: string, info: FieldInfo, units: UnitSystem): Parsed {
	const parsed = info.kind === 'ratio' ? parseDecimal(text) : fromDisplay(text, info.kind, units);
	if (!parsed.ok) return parsed;
	const broken = checkRule(parsed.value, info.rule);
	return broken ? { ok: false, message: broken } : parsed;
}

/**
 * Reads a list of positions typed as numbers separated by spaces or semicolons (a comma may be a
 * decimal comma, so it never separates).
 * @example
 * parsePositionList('1,5; 3', 'SI') // { ok: true, values: [1.5, 3] }
 */
export function parsePositionList(
	text: string,
	units: UnitSystem
): { ok: true; values: number[] } | { ok: false; message: string } {
	const parts = text.split(/[;\s]+/).filter((part) => part !== '');
	if (parts.length === 0) return { ok: false, message: 'Enter at least one position.' };
	const values: number[] = [];
	for (const part of parts) {
		const parsed = parseFieldText(part, { kind: 'length', rule: 'non-negative' }, units);
		if (!parsed.ok) return { ok: false, message: `${part}: ${parsed.message}` };
		values.push(parsed.value);
	}
	return { ok: true, values };
}

/**
 * An empty text: the value it leaves in the case (blank when required, absent when optional).
 * @example
 * readBlankText(' ', { kind: 'dimension', rule: 'non-negative', optional: true }) // { blank: true, value: undefined }
 */
export function readBlankText(
	text: string,
	info: FieldInfo
): { blank: true; value: number | undefined } | { blank: false } {
	if (text.trim() !== '') return { blank: false };
	return { blank: true, value: info.optional ? undefined : BLANK };
}
