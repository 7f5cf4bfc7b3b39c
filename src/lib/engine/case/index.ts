/**
 * The case file (`hingepoint.case`): its JSON shape, and `parseCase`, which validates it once
 * and converts it to the internal model.
 */
export { parseCase } from './parse-case';
export { DEFAULT_FACTORS } from './parse-options';
export {
	CASE_FORMAT,
	CASE_VERSION,
	type CaseAction,
	type CaseBeam,
	type CaseFactors,
	type CaseFile,
	type CaseLoad,
	type CaseModel,
	type CaseRestraint,
	type ResolvedFactors
} from './types';
