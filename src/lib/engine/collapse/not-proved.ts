/**
 * The plain answer when the linear programs break down by rounding (a stalled simplex, a margin
 * program that rounding made infeasible): no load factor is claimed, and the result says so.
 */
import type { CollapseProblem, CollapseResult } from './types';

/** Messages of the numerical invariants that rounding alone can break on a valid problem. */
const NUMERICAL = ['simplex did not terminate', 'margin program', 'static program infeasible'];

/** True when a thrown error is a numerical breakdown, not a broken input invariant. */
export function isNumericalBreakdown(e: unknown): boolean {
	return e instanceof Error && NUMERICAL.some((m) => e.message.includes(m));
}

/** A not-certified result with λ = 0, no hinges and a zero diagram. */
export function reportNotProved(problem: CollapseProblem): CollapseResult {
	const length = problem.beam.spans.reduce((a, b) => a + b, 0);
	return {
		status: 'not-certified',
		certified: false,
		message:
			'No certified answer: the linear programs did not settle within rounding for this beam. ' +
			'Do not rely on any load factor.',
		loadFactor: 0,
		lowerBound: 0,
		upperBound: 0,
		gap: 1,
		hinges: [],
		mechanism: { name: 'not found', spans: [] },
		diagram: { x: [0, length], M: [0, 0], V: [0, 0] },
		reactions: problem.beam.supports.map(() => 0),
		equilibriumResidual: 0
	};
}
