import type { SectionFamily } from './types';

/** A designation broken into the family the user named (if any) and its numbers. */
export interface ParsedDesignation {
	family: SectionFamily | null;
	numbers: number[];
	/** Letters that name no family, e.g. a typo such as `UV`. */
	unknownWord: string | null;
}

const FAMILY_WORDS: Record<string, SectionFamily> = {
	ub: 'UB',
	uc: 'UC',
	ipe: 'IPE',
	hea: 'HEA',
	hee: 'HEA',
	ha: 'HEA',
	heb: 'HEB',
	hb: 'HEB',
	w: 'W',
	wf: 'W',
	shs: 'SHS',
	rhs: 'RHS',
	chs: 'CHS'
};

/**
 * Reads a designation the way people type it: any case, spaces or none, `x`, `X`, `×` or `*`
 * between numbers, comma decimals, the family before or after (`305x165x40 UB`, `HE 300 B`).
 * @example parseDesignation('he 300 b') // { family: 'HEB', numbers: [300], unknownWord: null }
 * @example parseDesignation('100x100x6,3') // { family: null, numbers: [100, 100, 6.3], … }
 */
export function parseDesignation(text: string): ParsedDesignation {
	const cleaned = text
		.toLowerCase()
		.replace(/[×*]/g, 'x')
		.replace(/(\d),(\d)/g, '$1.$2');
	const numbers = (cleaned.match(/\d+(?:\.\d+)?/g) ?? []).map(Number);
	const words = cleaned
		.replace(/\d+(?:\.\d+)?/g, ' ')
		.split(/[^a-z]+/)
		.filter((w) => w !== '' && w !== 'x');
	// `HE 300 B` splits the family around the size; joining the letters puts it back together.
	const joined = words.join('');
	if (joined === '') return { family: null, numbers, unknownWord: null };
	// Own keys only: typed words such as "constructor" must not reach Object.prototype.
	const family = Object.hasOwn(FAMILY_WORDS, joined) ? FAMILY_WORDS[joined] : null;
	return { family, numbers, unknownWord: family ? null : joined };
}
