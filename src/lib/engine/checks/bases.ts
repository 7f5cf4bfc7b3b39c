/**
 * The design bases the engine knows, and the default. The one place basis-neutral code reaches a
 * basis folder from (the layering test exempts this file only).
 */
import type { CaseBasis } from '../case/types';
import type { InputIssue } from '../model/issue';
import type { FactorSettings } from './basis-types';
import type { DesignBasis } from './design-basis';
import { aiscAsd, aiscLrfd } from './aisc360/index';
import { en1993 } from './en1993/index';

/** The basis a case is checked on when it names none. */
export const DEFAULT_BASIS: DesignBasis<FactorSettings> = en1993;

/** Each basis a case may name; one not yet built is absent, never stood in for by another. */
const BASES: Partial<Record<CaseBasis, DesignBasis<FactorSettings>>> = {
	eurocode: en1993,
	'aisc-lrfd': aiscLrfd,
	'aisc-asd': aiscAsd
};

/** Plain names of the bases a case may name, for messages. */
const BASIS_NAMES: Record<CaseBasis, string> = {
	eurocode: 'Eurocode (EN 1990 / EN 1993-1-1)',
	'aisc-lrfd': 'AISC 360-22 LRFD with ASCE 7-22 combinations',
	'aisc-asd': 'AISC 360-22 ASD with ASCE 7-22 combinations'
};

/**
 * The design basis a case names, or null when this version of the engine does not have it.
 * @example findBasis('eurocode')?.id // 'en1993'
 */
export function findBasis(id: CaseBasis): DesignBasis<FactorSettings> | null {
	return Object.hasOwn(BASES, id) ? (BASES[id] ?? null) : null;
}

/**
 * The issue for a case whose basis this engine does not have (no answer is given on another
 * basis instead), or null when it has it.
 * @example explainMissingBasis('eurocode') // null
 */
export function explainMissingBasis(id: CaseBasis): InputIssue | null {
	if (findBasis(id)) return null;
	const message =
		`The ${BASIS_NAMES[id]} basis is not available in this version yet, so no answer is ` +
		'given. A Eurocode answer is not a substitute for it.';
	return { path: 'basis', code: 'basis-not-available', message, severity: 'error' };
}
