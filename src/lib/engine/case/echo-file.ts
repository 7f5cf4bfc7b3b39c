/**
 * The case as read, for the report and for storing: only the fields of the format, copied from a
 * file that has passed validation. Unknown keys (warned about) are left behind, so nothing the
 * engine did not check can reach a report.
 */
import { LOAD_KEYS } from './parse-loads';
import { SHAPE_KEYS } from './parse-section';
import { isRecord } from './read-value';
import type { CaseFile } from './types';

/** Keys of each part of the format; the readers in this folder check each of them. */
export const FILE_KEYS = {
	top: [
		'format',
		'version',
		'title',
		'basis',
		'units',
		'beam',
		'loads',
		'factors',
		'deflectionLimit',
		'deflectionLimitTotal',
		'deflectionGoverns',
		'eta',
		'place'
	],
	beam: [
		'spans',
		'supports',
		'joints',
		'section',
		'grade',
		'sectionLoss',
		'selfWeight',
		'restraint',
		'bearing',
		'bearingLoads',
		'gradeConfirmed'
	],
	grade: ['fy', 'fu'],
	restraint: ['lateral', 'loadHeight'],
	factors: [
		'permanent',
		'permanentAlone',
		'permanentFavourable',
		'imposed',
		'temporary',
		'gammaM0',
		'gammaM1',
		'xi',
		'psi0',
		'psi0Temporary',
		'set'
	]
} as const;

/** A finite number, a string or a boolean; anything else is not echoed. */
function isPlain(v: unknown): boolean {
	return typeof v === 'string' || typeof v === 'boolean' || Number.isFinite(v);
}

/** A copy of the listed keys whose values are plain. */
function pickPlain(obj: Record<string, unknown>, keys: readonly string[]): Record<string, unknown> {
	const out: Record<string, unknown> = {};
	for (const key of keys) if (Object.hasOwn(obj, key) && isPlain(obj[key])) out[key] = obj[key];
	return out;
}

/** A list of plain values (spans, supports, joints, bearing lengths, restraint positions). */
function copyList(value: unknown): unknown[] | undefined {
	return Array.isArray(value) ? value.map((v) => (isPlain(v) ? v : null)) : undefined;
}

function copySection(spec: unknown): unknown {
	if (Array.isArray(spec)) return spec.map(copySection);
	if (!isRecord(spec)) return spec;
	// The form checks read one family of keys: a designation, an Mp, or a shape's dimensions.
	if ('designation' in spec) return pickPlain(spec, ['designation']);
	if ('mp' in spec) return pickPlain(spec, ['mp', 'mass']);
	const shape = typeof spec.shape === 'string' && Object.hasOwn(SHAPE_KEYS, spec.shape);
	const keys = shape ? SHAPE_KEYS[spec.shape as string] : [];
	return pickPlain(spec, ['shape', ...keys, ...(spec.shape === 'RHS' ? ['process'] : [])]);
}

function copyBeam(beam: Record<string, unknown>): Record<string, unknown> {
	const out = pickPlain(beam, FILE_KEYS.beam);
	for (const key of ['spans', 'supports', 'joints', 'bearing'] as const) {
		const list = copyList(beam[key]);
		if (list) out[key] = list;
	}
	if (beam.section !== undefined) out.section = copySection(beam.section);
	if (isRecord(beam.grade)) out.grade = pickPlain(beam.grade, FILE_KEYS.grade);
	if (isRecord(beam.restraint)) {
		const r = pickPlain(beam.restraint, FILE_KEYS.restraint);
		const lateral = copyList(beam.restraint.lateral);
		out.restraint = lateral ? { ...r, lateral } : r;
	}
	return out;
}

/**
 * The known parts of a validated file (file units), without unknown keys at any level.
 * @example echoFile({ format: 'hingepoint.case', version: 1, extra: 1, … }).extra // undefined
 */
export function echoFile(json: Record<string, unknown>): CaseFile {
	const out = pickPlain(json, FILE_KEYS.top);
	if (isRecord(json.beam)) out.beam = copyBeam(json.beam);
	if (Array.isArray(json.loads)) {
		out.loads = json.loads.map((l) => {
			if (!isRecord(l) || typeof l.kind !== 'string' || !Object.hasOwn(LOAD_KEYS, l.kind)) return l;
			return pickPlain(l, LOAD_KEYS[l.kind as keyof typeof LOAD_KEYS]);
		});
	}
	if (isRecord(json.factors)) out.factors = pickPlain(json.factors, FILE_KEYS.factors);
	return out as unknown as CaseFile;
}
