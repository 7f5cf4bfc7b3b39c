/**
 * Reads the optional parts of a case file: partial factors, lateral restraint, bearing lengths
 * and the deflection limit. The member checks interpret the last three; here they are only
 * validated as data and converted to mm.
 */
import type { InputIssue } from '../model/issue';
import { measureBeam, readPosition } from './parse-loads';
import { RANGES, SIZE_LIMITS, type Range } from './limits';
import {
	addError,
	addWarning,
	isRecord,
	readArray,
	readChoice,
	readNumber,
	readText,
	warnUnknownKeys
} from './read-value';
import type { CaseModel, ResolvedFactors } from './types';

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

const FACTOR_KEYS = ['permanent', 'imposed', 'temporary', 'gammaM0', 'gammaM1'] as const;
/** Combination values the design checks read; passed through when given. */
const EXTRA_KEYS = ['xi', 'psi0', 'psi0Temporary', 'permanentFavourable'] as const;
type FactorKey = (typeof FACTOR_KEYS)[number] | (typeof EXTRA_KEYS)[number];

/** Plausible range of each factor (./limits.ts). */
const FACTOR_RANGES: Record<FactorKey, Range> = {
	permanent: RANGES.loadFactor,
	imposed: RANGES.loadFactor,
	temporary: RANGES.loadFactor,
	gammaM0: RANGES.materialFactor,
	gammaM1: RANGES.materialFactor,
	xi: RANGES.xi,
	psi0: RANGES.psi,
	psi0Temporary: RANGES.psi,
	permanentFavourable: RANGES.favourableFactor
};

/**
 * Partial factors with defaults; `temporary` defaults to the imposed-load factor in use.
 * @example parseFactors({ imposed: 1.6 }, issues).temporary // 1.6
 */
export function parseFactors(value: unknown, issues: InputIssue[]): ResolvedFactors | undefined {
	if (value === undefined) return { ...DEFAULT_FACTORS };
	if (!isRecord(value)) {
		const message = 'The factors must be an object, e.g. {"permanent": 1.35}.';
		addError(issues, 'factors', 'not-an-object', message);
		return undefined;
	}
	warnUnknownKeys(value, [...FACTOR_KEYS, ...EXTRA_KEYS, 'set'], 'factors', issues);
	const out: Partial<ResolvedFactors> = {};
	let ok = true;
	for (const key of FACTOR_KEYS) {
		if (value[key] === undefined) continue;
		const rule = { label: `factor ${key}`, range: FACTOR_RANGES[key] };
		const v = readNumber(value[key], `factors.${key}`, issues, rule);
		if (v === undefined) ok = false;
		else out[key] = v;
	}
	const extra: Partial<Record<(typeof EXTRA_KEYS)[number], number>> = {};
	for (const key of EXTRA_KEYS) {
		if (value[key] === undefined) continue;
		const rule = { label: `factor ${key}`, range: FACTOR_RANGES[key] };
		const v = readNumber(value[key], `factors.${key}`, issues, rule);
		if (v === undefined) ok = false;
		else extra[key] = v;
	}
	for (const key of ['gammaM0', 'gammaM1'] as const) {
		if ((out[key] ?? 1) >= 1) continue;
		const message = `${key} below 1.0 is less safe than any code value.`;
		addWarning(issues, `factors.${key}`, 'factor-below-one', message);
	}
	// Names of the factor sets the design checks know (checks/en1993/factors.ts).
	const sets = ['en1990-6.10', 'en1990-6.10ab', 'custom'] as const;
	if (
		value.set !== undefined &&
		!readChoice(value.set, 'factors.set', issues, sets, 'factor set')
	) {
		ok = false;
	}
	if (!ok) return undefined;
	const imposed = out.imposed ?? DEFAULT_FACTORS.imposed;
	return {
		permanent: out.permanent ?? DEFAULT_FACTORS.permanent,
		imposed,
		temporary: out.temporary ?? imposed,
		gammaM0: out.gammaM0 ?? DEFAULT_FACTORS.gammaM0,
		gammaM1: out.gammaM1 ?? DEFAULT_FACTORS.gammaM1,
		...extra,
		...(typeof value.set === 'string' ? { set: value.set } : {})
	};
}

/**
 * Without a restraint entry: the compression flange held only at the supports, the load on the
 * top flange (destabilising) — the cautious reading, as the app assumes for a new check.
 */
export const ASSUMED_RESTRAINT = { lateral: 'ends-only', loadHeight: 'top-flange' } as const;

/** Reads `beam.restraint`; positions in m become mm. A missing entry takes ASSUMED_RESTRAINT. */
export function parseRestraint(
	value: unknown,
	spans: number[] | undefined,
	issues: InputIssue[]
): CaseModel['restraint'] {
	if (value === undefined) {
		const message =
			'No restraint given: the compression flange is taken as held laterally only at the ' +
			'supports, with the load on the top flange. Give "restraint" to change this.';
		addWarning(issues, 'beam.restraint', 'restraint-assumed', message);
		return { ...ASSUMED_RESTRAINT };
	}
	if (!isRecord(value)) {
		const message = 'The restraint must be an object with "lateral".';
		addError(issues, 'beam.restraint', 'not-an-object', message);
		return undefined;
	}
	warnUnknownKeys(value, ['lateral', 'loadHeight'], 'beam.restraint', issues);
	const heights = ['top-flange', 'shear-centre', 'bottom-flange'] as const;
	const loadHeight =
		value.loadHeight === undefined
			? undefined
			: readChoice(value.loadHeight, 'beam.restraint.loadHeight', issues, heights, 'load height');
	const lat = value.lateral;
	const height = loadHeight ? { loadHeight } : {};
	if (lat === 'continuous' || lat === 'ends-only') return { lateral: lat, ...height };
	if (!Array.isArray(lat)) {
		const message = 'Lateral restraint: "continuous", "ends-only" or a list of positions in m.';
		addError(issues, 'beam.restraint.lateral', 'not-one-of', message);
		return undefined;
	}
	const max = SIZE_LIMITS.restraints;
	if (!readArray(lat, 'beam.restraint.lateral', issues, { label: 'restraint positions', max })) {
		return undefined;
	}
	const length = spans ? measureBeam(spans) : undefined;
	const xs = lat.map((v, i) =>
		readPosition(v, `beam.restraint.lateral[${i}]`, length, issues, 'off-beam')
	);
	if (xs.some((x) => x === undefined)) return undefined;
	return { lateral: (xs as number[]).sort((a, b) => a - b), ...height };
}

/** Reads `beam.bearing`: one stiff bearing length per support, mm, zero or more. */
export function parseBearing(
	value: unknown,
	supports: number | undefined,
	issues: InputIssue[]
): number[] | undefined {
	if (value === undefined) return undefined;
	const count = supports ?? SIZE_LIMITS.spans + 1;
	if (!Array.isArray(value) || value.length > count || (supports && value.length !== supports)) {
		addError(issues, 'beam.bearing', 'wrong-length', 'Give one bearing length (mm) per support.');
		return undefined;
	}
	const rule = { label: 'bearing length (mm)', range: RANGES.bearing };
	const out = value.map((v, i) => readNumber(v, `beam.bearing[${i}]`, issues, rule));
	return out.every((v): v is number => v !== undefined) ? out : undefined;
}

/** Settings the member checks read: deflection limits, η, grade confirmation, bearing, place. */
export type CheckSettings = Pick<
	CaseModel,
	| 'deflectionLimit'
	| 'deflectionLimitTotal'
	| 'deflectionGoverns'
	| 'eta'
	| 'gradeConfirmed'
	| 'bearingLoads'
	| 'place'
>;

/**
 * Reads the optional check settings of the file and its beam; each is validated as data only.
 * @example parseCheckSettings({ deflectionLimit: 200 }, {}, issues) // { deflectionLimit: 200 }
 */
export function parseCheckSettings(
	file: Record<string, unknown>,
	beam: Record<string, unknown>,
	issues: InputIssue[]
): CheckSettings {
	const out: CheckSettings = {};
	const ratio = (key: 'deflectionLimit' | 'deflectionLimitTotal') => {
		if (file[key] === undefined) return;
		const rule = { label: 'deflection limit (span divided by)', range: RANGES.deflectionRatio };
		const v = readNumber(file[key], key, issues, rule);
		if (v !== undefined) out[key] = v;
	};
	ratio('deflectionLimit');
	ratio('deflectionLimitTotal');
	if (file.eta !== undefined) {
		const rule = { label: 'η (EN 1993-1-5 5.1)', range: RANGES.eta };
		const v = readNumber(file.eta, 'eta', issues, rule);
		if (v !== undefined) out.eta = v;
	}
	if (beam.bearingLoads !== undefined) {
		const rule = { label: 'bearing length under loads (mm)', range: RANGES.bearing };
		const v = readNumber(beam.bearingLoads, 'beam.bearingLoads', issues, rule);
		if (v !== undefined) out.bearingLoads = v;
	}
	const flag = (value: unknown, path: string): boolean | undefined => {
		if (value === undefined || typeof value === 'boolean') return value;
		addError(issues, path, 'not-a-boolean', 'This must be true or false.');
		return undefined;
	};
	const governs = flag(file.deflectionGoverns, 'deflectionGoverns');
	if (governs !== undefined) out.deflectionGoverns = governs;
	const confirmed = flag(beam.gradeConfirmed, 'beam.gradeConfirmed');
	if (confirmed !== undefined) out.gradeConfirmed = confirmed;
	if (file.place !== undefined) {
		const place = readText(file.place, 'place', issues, { label: 'place', max: SIZE_LIMITS.place });
		if (place !== undefined) out.place = place;
	}
	return out;
}
