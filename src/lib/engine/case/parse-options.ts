/**
 * Reads the optional parts of a case file: lateral restraint, bearing lengths and the deflection
 * limit (partial factors: ./parse-factors.ts). The member checks interpret them; here they are
 * only validated as data and converted to mm.
 */
import type { InputIssue } from '../model/issue';
import { measureBeam, readPosition } from './parse-loads';
import { RANGES, SIZE_LIMITS } from './limits';
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
import type { CaseModel } from './types';

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
