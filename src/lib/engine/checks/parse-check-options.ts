/**
 * Reads the case-file fields only the design checks use: the factor-set name, the favourable
 * permanent factor, bearing under point loads, grade confirmation, deflection settings, η and
 * the place. Problems become InputIssues naming the field; nothing here throws.
 */
import { addError, isRecord, readChoice, readNumber } from '../case/read-value';
import type { CaseModel } from '../case/types';
import type { InputIssue } from '../model/issue';

/** Factor-set names a case file may use. */
export const FACTOR_SET_NAMES = ['en1990-6.10', 'en1990-6.10ab', 'custom'] as const;

/** Case-model fields read here. */
export type CheckOptions = Pick<
	CaseModel,
	'bearingLoads' | 'deflectionLimitTotal' | 'deflectionGoverns' | 'eta' | 'gradeConfirmed' | 'place'
> & { factorSet?: (typeof FACTOR_SET_NAMES)[number]; permanentFavourable?: number };

/**
 * Reads the check options of a case file (the whole parsed JSON).
 * @example
 * readCheckOptions({ eta: 0 }, issues) // issue at `eta`: must be greater than zero
 */
export function readCheckOptions(json: Record<string, unknown>, issues: InputIssue[]): CheckOptions {
	const out: CheckOptions = {};
	const f = isRecord(json.factors) ? json.factors : {};
	if (f.set !== undefined) {
		const set = readChoice(f.set, 'factors.set', issues, FACTOR_SET_NAMES, 'factor set');
		if (set) out.factorSet = set;
	}
	if (f.permanentFavourable !== undefined) {
		const v = readNumber(f.permanentFavourable, 'factors.permanentFavourable', issues, { label: 'favourable permanent factor', min: 0 });
		if (v !== undefined) out.permanentFavourable = v;
	}
	const beam = isRecord(json.beam) ? json.beam : {};
	if (beam.bearingLoads !== undefined) {
		const v = readNumber(beam.bearingLoads, 'beam.bearingLoads', issues, { label: 'bearing length under loads (mm)', min: 0 });
		if (v !== undefined) out.bearingLoads = v;
	}
	if (beam.gradeConfirmed !== undefined) {
		if (typeof beam.gradeConfirmed !== 'boolean') addError(issues, 'beam.gradeConfirmed', 'not-a-boolean', 'gradeConfirmed must be true or false.');
		else out.gradeConfirmed = beam.gradeConfirmed;
	}
	if (json.deflectionLimitTotal !== undefined) {
		const v = readNumber(json.deflectionLimitTotal, 'deflectionLimitTotal', issues, { label: 'deflection limit for all loads (span divided by)', positive: true });
		if (v !== undefined) out.deflectionLimitTotal = v;
	}
	if (json.deflectionGoverns !== undefined) {
		if (typeof json.deflectionGoverns !== 'boolean') addError(issues, 'deflectionGoverns', 'not-a-boolean', 'deflectionGoverns must be true or false.');
		else out.deflectionGoverns = json.deflectionGoverns;
	}
	if (json.eta !== undefined) {
		const v = readNumber(json.eta, 'eta', issues, { label: 'η (shear area factor)', positive: true });
		if (v !== undefined) out.eta = v;
	}
	if (json.place !== undefined) {
		if (typeof json.place !== 'string') addError(issues, 'place', 'not-a-string', 'The place must be text.');
		else out.place = json.place;
	}
	return out;
}
