/** Public API of the steel-grade library. */
export type * from './types';
export {
	resolveGrade,
	listGrades,
	type GradeChoice,
	type GradeListOptions,
	type GradeOptions
} from './grades';
export { REFUSED_MATERIALS, explainRefusedMaterial } from './refused';
export { GRADE_ROWS } from './grade-table';
export { computeEpsilon } from './epsilon';
export { HISTORIC_GRADE_ROWS } from './historic-grades';
export { US_GRADE_ROWS } from './us-grades';
export { US_HISTORIC_GRADE_ROWS } from './us-historic-grades';
export { AISC_MODULI, EUROCODE_MODULI, type SteelModuli } from './moduli';
