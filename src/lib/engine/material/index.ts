/** Public API of the steel-grade library. */
export type * from './types';
export { resolveGrade, listGrades, type GradeChoice } from './grades';
export { REFUSED_MATERIALS, explainRefusedMaterial } from './refused';
export { GRADE_ROWS } from './grade-table';
export { computeEpsilon } from './epsilon';
export { HISTORIC_GRADE_ROWS } from './historic-grades';
