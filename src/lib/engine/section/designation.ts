import type { SectionFamily } from './types';
import { replaceFractions } from './fraction';

/** A designation broken into the family the user named (if any) and its numbers. */
export interface ParsedDesignation {
	family: SectionFamily | null;
	numbers: number[];
	/** Letters that name no family, e.g. a typo such as `UV`. */
	unknownWord: string | null;
	/** Pipe weight class (`std`, `xs`, `xxs`) when one was written; null otherwise. */
	weight: string | null;
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
	hem: 'HEM',
	hm: 'HEM',
	w: 'W',
	wf: 'W',
	hp: 'HP',
	s: 'S',
	hss: 'HSS',
	pipe: 'PIPE',
	shs: 'SHS',
	rhs: 'RHS',
	chs: 'CHS',
	cfshs: 'CFSHS',
	shscf: 'CFSHS',
	cfrhs: 'CFRHS',
	rhscf: 'CFRHS',
	cfchs: 'CFCHS',
	chscf: 'CFCHS'
};

/** Pipe weight classes as written after the size (`Pipe 4 Std`, `Pipe4XS`). */
const PIPE_WEIGHTS = ['std', 'xs', 'xxs'];

/** Family and pipe weight named by the letters of a designation, joined. */
function readWords(joined: string): Pick<ParsedDesignation, 'family' | 'weight'> | null {
	// Own keys only: typed words such as "constructor" must not reach Object.prototype.
	if (Object.hasOwn(FAMILY_WORDS, joined)) return { family: FAMILY_WORDS[joined], weight: null };
	const weight = PIPE_WEIGHTS.find((w) => joined === `pipe${w}` || joined === w);
	return weight ? { family: 'PIPE', weight } : null;
}

/**
 * Reads a designation the way people type it: any case, spaces or none, `x`, `X`, `×` or `*`
 * between numbers, comma decimals, inch fractions (`3/8`, `5-1/2`), the family before or after
 * (`305x165x40 UB`, `HE 300 B`, `HE 1000 M`), `CF` marking a cold-formed hollow section, and a
 * pipe's weight class (`Pipe 4 Std`, `Pipe 4 XS`).
 * @example parseDesignation('he 300 b') // { family: 'HEB', numbers: [300], … }
 * @example parseDesignation('HSS8x6x1/2').numbers // [8, 6, 0.5]
 * @example parseDesignation('100x100x6,3') // { family: null, numbers: [100, 100, 6.3], … }
 */
export function parseDesignation(text: string): ParsedDesignation {
	const cleaned = replaceFractions(
		text
			.toLowerCase()
			.replace(/[×*]/g, 'x')
			.replace(/(\d),(\d)/g, '$1.$2')
	);
	const numbers = (cleaned.match(/\d*\.?\d+/g) ?? []).map(Number);
	const words = cleaned
		.replace(/\d*\.?\d+/g, ' ')
		.split(/[^a-z]+/)
		.filter((w) => w !== '' && w !== 'x');
	// `HE 300 B` splits the family around the size; joining the letters puts it back together.
	const joined = words.join('');
	if (joined === '') return { family: null, numbers, unknownWord: null, weight: null };
	const read = readWords(joined);
	if (!read) return { family: null, numbers, unknownWord: joined, weight: null };
	return { ...read, numbers, unknownWord: null };
}
