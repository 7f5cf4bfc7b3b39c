/**
 * Exact plastic collapse of steel beam lines: the public API of the collapse solver.
 * Internal units: mm, N, N/mm, N·mm. See ../README.md for the theory.
 */
export type {
	CollapseDiagram,
	CollapseProblem,
	CollapseResult,
	CollapseSolution,
	Hinge,
	MechanismSummary
} from './types';
export { measureFixedLoadMargin, solveCollapse, solveCollapseLoadFactor } from './solve';
export { momentAt, shearAt, type DiagramSource } from './diagram';
export { validateCollapseProblem } from './validate-problem';
export { CERTIFY_GAP } from './certified-field';
