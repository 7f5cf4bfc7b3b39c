/**
 * Short names for the case-file keys, to keep links short. Codes are never reused for another
 * key: a link made today must still open after keys are added.
 */
export const KEY_CODES: Readonly<Record<string, string>> = {
	version: 'v',
	title: 't',
	beam: 'b',
	spans: 's',
	supports: 'u',
	joints: 'j',
	section: 'n',
	designation: 'd',
	grade: 'g',
	sectionLoss: 'o',
	selfWeight: 'w',
	restraint: 'r',
	lateral: 'q',
	loadHeight: 'h',
	bearing: 'e',
	loads: 'l',
	kind: 'k',
	x: 'X',
	value: 'a',
	action: 'c',
	from: 'F',
	to: 'T',
	start: 'S',
	end: 'E',
	label: 'L',
	factors: 'f',
	permanent: 'P',
	imposed: 'I',
	temporary: 'M',
	gammaM0: '0',
	gammaM1: '1',
	set: 'z',
	deflectionLimit: 'D'
};

const DECODE = new Map(Object.entries(KEY_CODES).map(([key, code]) => [code, key]));
const ESCAPE = '~';

/**
 * Replaces known keys by their codes, everywhere in a JSON value. A key that looks like a code
 * (or starts with the escape mark) is escaped, so `expandKeys` restores any object exactly.
 * @example
 * compactKeys({ beam: { spans: [6] } }) // { b: { s: [6] } }
 */
export function compactKeys(value: unknown): unknown {
	return mapKeys(value, (key) => {
		if (Object.hasOwn(KEY_CODES, key)) return KEY_CODES[key];
		return DECODE.has(key) || key.startsWith(ESCAPE) ? ESCAPE + key : key;
	});
}

/**
 * Undoes `compactKeys`.
 * @example
 * expandKeys({ b: { s: [6] } }) // { beam: { spans: [6] } }
 */
export function expandKeys(value: unknown): unknown {
	return mapKeys(value, (key) => (key.startsWith(ESCAPE) ? key.slice(1) : (DECODE.get(key) ?? key)));
}

function mapKeys(value: unknown, rename: (key: string) => string): unknown {
	if (Array.isArray(value)) return value.map((item) => mapKeys(item, rename));
	if (typeof value !== 'object' || value === null) return value;
	// fromEntries defines own properties, so a key such as __proto__ stays plain data.
	return Object.fromEntries(Object.entries(value).map(([k, v]) => [rename(k), mapKeys(v, rename)]));
}
