/**
 * Reads the partial factors of a case file with the defaults of its design basis: EN 1990 on the
 * Eurocode basis, ASCE 7-22 on the AISC bases. Which combinations they form is the basis's job
 * (checks/); here each factor is validated as data and the set named is one the basis knows.
 */
import { ASCE7_FACTORS as BY_METHOD } from '../checks/aisc360/combinations';
import type { InputIssue } from '../model/issue';
import { RANGES, type Range } from './limits';
import { addError, addWarning, isRecord, readChoice, readNumber } from './read-value';
import type { CaseBasis, ResolvedFactors } from './types';

/**
 * EN 1990 Table A1.2(B) recommended γG = 1.35, γQ = 1.5 for equation 6.10; temporary loads take
 * γQ; EN 1993-1-1 6.1 NOTE 2B recommended γM0 = γM1 = 1.0.
 */
export const DEFAULT_FACTORS: Readonly<ResolvedFactors> = {
	permanent: 1.35,
	imposed: 1.5,
	temporary: 1.5,
	gammaM0: 1.0,
	gammaM1: 1.0
};

/**
 * ASCE 7-22 basic combinations (from memory): strength design 2.3.1 (1) 1.4D, (2) 1.2D + 1.6L;
 * allowable stress design 2.4.1 (1) D, (2) D + L. The proposed temporary load is live load unless
 * the case says otherwise (engineering reference C.7).
 */
export const ASCE7_FACTORS = {
	'asce7-lrfd': fromMethod(BY_METHOD.lrfd),
	'asce7-asd': fromMethod(BY_METHOD.asd)
} as const;

/** The case file's names for the factors of one method (the values live with the combinations). */
function fromMethod(f: (typeof BY_METHOD)[keyof typeof BY_METHOD]) {
	return { permanent: f.dead, permanentAlone: f.alone, imposed: f.live };
}

/**
 * Factor sets each basis knows; the first is its default. LRFD load factors belong with φ and
 * ASD ones with Ω, so each AISC basis takes only its own set (or custom factors).
 */
export const FACTOR_SETS: Record<CaseBasis, readonly string[]> = {
	eurocode: ['en1990-6.10', 'en1990-6.10ab', 'custom'],
	'aisc-lrfd': ['asce7-lrfd', 'custom'],
	'aisc-asd': ['asce7-asd', 'custom']
};

/** Factor keys read on each basis; the other keys of the format are warned about there. */
const EN_KEYS = [
	'permanent',
	'imposed',
	'temporary',
	'gammaM0',
	'gammaM1',
	'xi',
	'psi0',
	'psi0Temporary',
	'permanentFavourable'
] as const;
const AISC_KEYS = ['permanent', 'permanentAlone', 'imposed', 'temporary'] as const;
type FactorKey = (typeof EN_KEYS)[number] | (typeof AISC_KEYS)[number];

/** Plausible range of each factor (./limits.ts). */
const FACTOR_RANGES: Record<FactorKey, Range> = {
	permanent: RANGES.loadFactor,
	permanentAlone: RANGES.loadFactor,
	imposed: RANGES.loadFactor,
	temporary: RANGES.loadFactor,
	gammaM0: RANGES.materialFactor,
	gammaM1: RANGES.materialFactor,
	xi: RANGES.xi,
	psi0: RANGES.psi,
	psi0Temporary: RANGES.psi,
	permanentFavourable: RANGES.favourableFactor
};

/** All keys of the `factors` object of the format. */
export const ALL_FACTOR_KEYS = [...EN_KEYS, 'permanentAlone', 'set'] as const;

/**
 * Partial factors with the basis's defaults; `temporary` defaults to the imposed (live) factor.
 * @example parseFactors({ imposed: 1.6 }, issues).temporary // 1.6
 * @example parseFactors(undefined, issues, 'aisc-lrfd') // 1.2D + 1.6L, 1.4D, temporary 1.6
 */
export function parseFactors(
	value: unknown,
	issues: InputIssue[],
	basis: CaseBasis = 'eurocode'
): ResolvedFactors | undefined {
	if (value !== undefined && !isRecord(value)) {
		const message = 'The factors must be an object, e.g. {"permanent": 1.35}.';
		addError(issues, 'factors', 'not-an-object', message);
		return undefined;
	}
	const given = value ?? {};
	const keys: readonly FactorKey[] = basis === 'eurocode' ? EN_KEYS : AISC_KEYS;
	warnForeignKeys(given, keys, basis, issues);
	const sets = FACTOR_SETS[basis];
	const set =
		given.set === undefined
			? undefined
			: readChoice(given.set, 'factors.set', issues, sets, `factor set on ${basis}`);
	const out: Partial<Record<FactorKey, number>> = {};
	let ok = given.set === undefined || set !== undefined;
	for (const key of keys) {
		if (given[key] === undefined) continue;
		const rule = { label: `factor ${key}`, range: FACTOR_RANGES[key] };
		const v = readNumber(given[key], `factors.${key}`, issues, rule);
		if (v === undefined) ok = false;
		else out[key] = v;
	}
	if (!ok) return undefined;
	if (basis === 'eurocode') return resolveEurocode(out, set, issues);
	return resolveAisc(out, set ?? sets[0], sets[0]);
}

/** Keys of the format that this basis does not read: warned about and dropped. */
function warnForeignKeys(
	given: Record<string, unknown>,
	keys: readonly string[],
	basis: CaseBasis,
	issues: InputIssue[]
): void {
	for (const key of Object.keys(given)) {
		if (key === 'set' || keys.includes(key)) continue;
		const known = (ALL_FACTOR_KEYS as readonly string[]).includes(key);
		const message = known
			? `"${key}" is not used on the ${basis} basis and was ignored.`
			: `"${key}" is not part of the case format and was ignored.`;
		addWarning(issues, `factors.${key}`, known ? 'not-on-basis' : 'unknown-key', message);
	}
}

function resolveEurocode(
	out: Partial<Record<FactorKey, number>>,
	set: string | undefined,
	issues: InputIssue[]
): ResolvedFactors {
	for (const key of ['gammaM0', 'gammaM1'] as const) {
		if ((out[key] ?? 1) >= 1) continue;
		const message = `${key} below 1.0 is less safe than any code value.`;
		addWarning(issues, `factors.${key}`, 'factor-below-one', message);
	}
	const imposed = out.imposed ?? DEFAULT_FACTORS.imposed;
	const extra: Partial<ResolvedFactors> = {};
	for (const key of ['xi', 'psi0', 'psi0Temporary', 'permanentFavourable'] as const) {
		if (out[key] !== undefined) extra[key] = out[key];
	}
	return {
		permanent: out.permanent ?? DEFAULT_FACTORS.permanent,
		imposed,
		temporary: out.temporary ?? imposed,
		gammaM0: out.gammaM0 ?? DEFAULT_FACTORS.gammaM0,
		gammaM1: out.gammaM1 ?? DEFAULT_FACTORS.gammaM1,
		...extra,
		...(set !== undefined ? { set } : {})
	};
}

/** ASCE 7 factors; a custom set starts from the basis's own set and takes what is given. */
function resolveAisc(
	out: Partial<Record<FactorKey, number>>,
	set: string,
	basisSet: string
): ResolvedFactors {
	const base = ASCE7_FACTORS[(set === 'custom' ? basisSet : set) as keyof typeof ASCE7_FACTORS];
	const imposed = out.imposed ?? base.imposed;
	return {
		set,
		permanent: out.permanent ?? base.permanent,
		permanentAlone: out.permanentAlone ?? base.permanentAlone,
		imposed,
		temporary: out.temporary ?? imposed
	};
}
