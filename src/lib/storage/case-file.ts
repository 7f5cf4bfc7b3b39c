import { CASE_FORMAT, type CaseFile } from '$lib/engine/case/types';

/**
 * The case file as storage and sharing see it: the engine's JSON shape in SI (m, kN, kN/m, kNm).
 * Storage checks only the header and the top-level shape; the engine's `checkCase` is the one
 * place that validates the beam and the loads.
 */
export type { CaseFile } from '$lib/engine/case/types';
export { CASE_FORMAT } from '$lib/engine/case/types';

/**
 * Whether a value has the shape of a case file at the top: our format name, a whole-number
 * version, a `beam` object and a `loads` list. Says nothing about whether they are valid.
 * @example
 * isCaseLike({ format: 'hingepoint.case', version: 1, beam: {}, loads: [] }) // true
 */
export function isCaseLike(value: unknown): value is CaseFile {
	if (!isPlainObject(value)) return false;
	const version = value.version;
	return (
		value.format === CASE_FORMAT &&
		Number.isInteger(version) &&
		(version as number) >= 1 &&
		isPlainObject(value.beam) &&
		Array.isArray(value.loads)
	);
}

/**
 * The section designation of a case, if one is recorded (e.g. 'UB 254x146x31'), for search.
 * Reads `beam.section` (or its first entry, one per span): its `designation`, else its `shape`.
 * @example
 * readSectionDesignation({ beam: { section: { designation: 'IPE 300' } } }) // 'IPE 300'
 */
export function readSectionDesignation(input: unknown): string {
	const beam = isPlainObject(input) ? input.beam : undefined;
	const raw = isPlainObject(beam) ? beam.section : undefined;
	const section: unknown = Array.isArray(raw) ? raw[0] : raw;
	if (typeof section === 'string') return section;
	if (!isPlainObject(section)) return '';
	if (typeof section.designation === 'string') return section.designation;
	return typeof section.shape === 'string' ? section.shape : '';
}

/** A non-null, non-array object. */
export function isPlainObject(value: unknown): value is Record<string, unknown> {
	return typeof value === 'object' && value !== null && !Array.isArray(value);
}
