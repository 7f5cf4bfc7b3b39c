/**
 * Short names for the case-file keys, to keep links short. Codes are never reused for another
 * key (a link made today must still open later), and none is a key the case already writes
 * short (x, h, b, r, t, d), so those need no escaping.
 */
export const KEY_CODES: Readonly<Record<string, string>> = {
	version: 'v',
	title: 'i',
	beam: 'B',
	spans: 's',
	supports: 'u',
	joints: 'j',
	section: 'n',
	designation: 'e',
	shape: 'y',
	process: 'p',
	mass: 'm',
	grade: 'g',
	sectionLoss: 'o',
	selfWeight: 'w',
	restraint: 'R',
	lateral: 'q',
	loadHeight: 'H',
	bearing: 'G',
	loads: 'l',
	kind: 'k',
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

/**
 * Short codes for the values of enumerated fields, keyed by the field's (long) key. Like the key
 * codes, a code is never reused for another value.
 */
export const VALUE_CODES: Readonly<Record<string, Readonly<Record<string, string>>>> = {
	kind: { point: 'p', uniform: 'u', linear: 'l' },
	shape: { I: 'i', 'welded-I': 'w', RHS: 'r', CHS: 'c', flat: 'f' },
	action: { permanent: 'g', imposed: 'q', temporary: 't' },
	supports: { pin: 'p', fixed: 'f', free: 'o' },
	joints: { continuous: 'c', simple: 's' },
	lateral: { continuous: 'c', 'ends-only': 'e' },
	loadHeight: { 'top-flange': 't', 'shear-centre': 's', 'bottom-flange': 'b' }
};

const ESCAPE = '~';

/** A reversible renaming of strings: known ones to codes, anything code-like escaped. */
interface Codebook {
	encode: (text: string) => string;
	decode: (text: string) => string;
}

function makeCodebook(codes: Readonly<Record<string, string>>): Codebook {
	const reverse = new Map(Object.entries(codes).map(([name, code]) => [code, name]));
	return {
		encode: (text) => {
			if (Object.hasOwn(codes, text)) return codes[text];
			return reverse.has(text) || text.startsWith(ESCAPE) ? ESCAPE + text : text;
		},
		decode: (text) => (text.startsWith(ESCAPE) ? text.slice(1) : (reverse.get(text) ?? text))
	};
}

const KEYS = makeCodebook(KEY_CODES);
const VALUES = new Map(
	Object.entries(VALUE_CODES).map(([key, codes]) => [key, makeCodebook(codes)])
);

/**
 * Replaces known keys and enumerated values by their codes, everywhere in a JSON value. Anything
 * that looks like a code is escaped, so `expandCase` restores any JSON value exactly.
 * @example
 * compactCase({ loads: [{ kind: 'point', x: 2 }] }) // { l: [{ k: 'p', x: 2 }] }
 */
export function compactCase(value: unknown): unknown {
	return walk(value, null, 'encode');
}

/**
 * Undoes `compactCase`.
 * @example
 * expandCase({ l: [{ k: 'p', x: 2 }] }) // { loads: [{ kind: 'point', x: 2 }] }
 */
export function expandCase(value: unknown): unknown {
	return walk(value, null, 'decode');
}

// `field` is the long key this value sits under, which decides whether its strings are coded.
function walk(value: unknown, field: string | null, way: keyof Codebook): unknown {
	if (typeof value === 'string') {
		const book = field === null ? undefined : VALUES.get(field);
		return book ? book[way](value) : value;
	}
	if (Array.isArray(value)) return value.map((item) => walk(item, field, way));
	if (typeof value !== 'object' || value === null) return value;
	// fromEntries defines own properties, so a key such as __proto__ stays plain data.
	return Object.fromEntries(
		Object.entries(value).map(([key, inner]) => {
			const renamed = KEYS[way](key);
			const long = way === 'encode' ? key : renamed;
			return [renamed, walk(inner, long, way)];
		})
	);
}
