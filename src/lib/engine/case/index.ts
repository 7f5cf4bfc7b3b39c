/**
 * The case file (`hingepoint.case`): its JSON shape, and `parseCase`, which validates it once
 * and converts it to the internal model.
 */
export { parseCase } from './parse-case';
export { ASCE7_FACTORS, DEFAULT_FACTORS, FACTOR_SETS } from './parse-factors';
export { convertUsFile } from './us-units';
export {
	CASE_BASES,
	CASE_FORMAT,
	CASE_UNITS,
	CASE_VERSION,
	type CaseAction,
	type CaseBasis,
	type CaseUnits,
	type CaseBeam,
	type CaseFactors,
	type CaseFile,
	type CaseLoad,
	type CaseModel,
	type CaseRestraint,
	type ResolvedFactors
} from './types';
