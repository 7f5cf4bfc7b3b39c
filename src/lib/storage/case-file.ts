/**
 * The case file as storage and sharing see it: a JSON object in SI (m, kN, kN/m, kNm) whose
 * `format` is 'hingepoint.case'. Storage treats the rest as opaque, structured-cloneable data;
 * the engine's `checkCase` is the one place that validates it.
 */
export interface CaseFileLike {
	format: 'hingepoint.case';
	version: number;
	title?: string;
	[key: string]: unknown;
}

/** The case-file format name written in every case. */
export const CASE_FORMAT = 'hingepoint.case';

/**
 * Whether a value looks like a case file: a plain object naming our format with a whole-number
 * version. Says nothing about whether the beam and loads are valid.
 * @example
 * isCaseLike({ format: 'hingepoint.case', version: 1 }) // true
 */
export function isCaseLike(value: unknown): value is CaseFileLike {
	if (!isPlainObject(value)) return false;
	const version = value.version;
	return value.format === CASE_FORMAT && Number.isInteger(version) && (version as number) >= 1;
}

/**
 * The section designation of a case, if one is recorded (e.g. '305x165x40 UB'), for search.
 * Reads `beam.section` as a string or as an object with a `designation` or `name`.
 * @example
 * readSectionDesignation({ beam: { section: { designation: 'IPE 300' } } }) // 'IPE 300'
 */
export function readSectionDesignation(input: unknown): string {
	const beam = isPlainObject(input) ? input.beam : undefined;
	const section = isPlainObject(beam) ? beam.section : undefined;
	if (typeof section === 'string') return section;
	if (!isPlainObject(section)) return '';
	for (const key of ['designation', 'name', 'label']) {
		if (typeof section[key] === 'string') return section[key];
	}
	return '';
}

/** A non-null, non-array object. */
export function isPlainObject(value: unknown): value is Record<string, unknown> {
	return typeof value === 'object' && value !== null && !Array.isArray(value);
}
