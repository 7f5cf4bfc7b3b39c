/**
 * solveCollapse: the exact collapse load factor of a beam line with its certificate.
 * Order of work: validate → normalise → margin under the fixed loads alone (fails-under-fixed?)
 * → static program for λ (unbounded?) → mechanism from the dual → bounds, diagram, reactions.
 */
import { assertFinite } from '../model/issue';
import { certifyField } from './certified-field';
import { measureLoadSize, normaliseProblem, type ProblemScale } from './normalise';
import { localiseSpace } from './local-basis';
import { solveEquilibrium } from './nullspace';
import { isNumericalBreakdown, reportNotProved } from './not-proved';
import { solveStaticProgram } from './lower-bound';
import { buildFieldModel } from './statics';
import { buildStations } from './stations';
import type { CollapseProblem, CollapseResult } from './types';
import { validateCollapseProblem } from './validate-problem';

/** A field in equilibrium with the fixed loads alone (λ = 0) and its margin. */
export interface FixedLoadField {
	z: number[];
	/**
	 * Largest uniform margin δ (|M| ≤ (1 − δ)·Mp) of any such field, from the static program;
	 * negative when the fixed loads alone exceed the collapse load.
	 */
	slack: number;
}

/** The field at λ = 0 with the largest uniform slack (normalised problem). */
export function findFixedLoadField(p: CollapseProblem): FixedLoadField {
	const model = buildFieldModel({ ...p, variableLoads: [] });
	const zero = new Array<number>(model.unknowns.length).fill(0);
	if (p.fixedLoads.length === 0) return { z: zero, slack: 1 };
	const grid = buildStations(model, p.capacity);
	const lambdaRow = zero.map((_, i) => (i === model.lambdaIndex ? 1 : 0));
	const space = localiseSpace(model, solveEquilibrium([...model.E, lambdaRow], [...model.f, 0]));
	const sol = solveStaticProgram({ model, space, ...grid, objective: 'margin' });
	if (sol.status !== 'optimal') throw new Error(`invariant: margin program ${sol.status}`);
	// The program's margin is exact once converged; the field's own slack is measured where used.
	return { z: sol.z, slack: sol.objective };
}

/** Throws when the problem has input errors (callers validate at the door). */
export function assertValidProblem(problem: CollapseProblem): void {
	const errors = validateCollapseProblem(problem).filter((i) => i.severity === 'error');
	if (errors.length > 0) {
		throw new Error(
			`invariant: invalid collapse problem: ${errors.map((e) => `${e.path} ${e.code}`).join(', ')}`
		);
	}
}

/** Result for fixed loads that already exceed the collapse load. */
export function reportFixedLoadFailure(
	slack: number
): CollapseResult & { status: 'fails-under-fixed' } {
	// With λ = 0 the program is homogeneous in the loads: 1 − slack is (fixed load)/(collapse load).
	const overstress = assertFinite(1 - slack, 'overstress');
	const percent = ((overstress - 1) * 100).toPrecision(3);
	return {
		status: 'fails-under-fixed',
		message: `The fixed loads alone already exceed the collapse load of the beam, by ${percent} %.`,
		overstress
	};
}

function solveLambdaProgram(p: CollapseProblem, fieldTolerance?: number) {
	const model = buildFieldModel(p);
	const grid = buildStations(model, p.capacity);
	const space = localiseSpace(model, solveEquilibrium(model.E, model.f));
	const sol = solveStaticProgram({ model, space, ...grid, objective: 'lambda', fieldTolerance });
	return { model, grid, sol, space };
}

/**
 * Uniform margin δ of the fixed loads alone: the largest δ for which a field in equilibrium
 * with them keeps |M| ≤ (1 − δ)·Mp everywhere; negative when they alone exceed the collapse
 * load, NaN where the program breaks down.
 */
export function measureFixedLoadMargin(problem: CollapseProblem): number {
	assertValidProblem(problem);
	const { problem: p } = normaliseProblem(problem);
	try {
		return findFixedLoadField(p).slack;
	} catch (e) {
		if (isNumericalBreakdown(e)) return NaN;
		throw e;
	}
}

/**
 * The collapse load factor alone, without mechanism or certificate, for searches that try many
 * capacities and certify only the last one: 0 when the fixed loads alone fail, null when the
 * variable loads can never cause collapse. Where the programs break down it is the full solve's
 * not-certified factor (0).
 * @param o.fixedLoadsFit the caller knows a field that carries the fixed loads alone within
 * this capacity (the margin program is then not needed)
 */
export function solveCollapseLoadFactor(
	problem: CollapseProblem,
	o: { fixedLoadsFit?: boolean } = {}
): number | null {
	assertValidProblem(problem);
	if (measureLoadSize(problem.variableLoads) === 0) return null;
	const { problem: p, scale } = normaliseProblem(problem);
	try {
		// The margin program first: a temporary load may relieve what the fixed loads alone
		// overload, and then the λ program alone would find a λ > 0 for a beam that fails first.
		if (!o.fixedLoadsFit && findFixedLoadField(p).slack < -1e-12) return 0;
		// Only λ is wanted, and λ settles long before the last rounding-level excess is gone.
		const { model, sol } = solveLambdaProgram(p, 1e-9);
		if (sol.status === 'unbounded') return null;
		if (sol.status !== 'optimal') return 0;
		return Math.max(0, sol.z[model.lambdaIndex]) * scale.lambda;
	} catch (e) {
		if (isNumericalBreakdown(e)) return 0;
		throw e;
	}
}

/** Solves a normalised problem whose fixed-load field is already known and admissible. */
export function solveNormalised(
	p: CollapseProblem,
	scale: ProblemScale,
	fixedField: FixedLoadField
): CollapseResult {
	const { model, grid, sol, space } = solveLambdaProgram(p);
	if (sol.status === 'unbounded') {
		return {
			status: 'unbounded',
			message:
				'The variable loads can never cause collapse: they relieve the beam or go straight ' +
				'into supports.'
		};
	}
	if (sol.status !== 'optimal')
		throw new Error('invariant: static program infeasible although λ = 0 is admissible');
	return certifyField({ model, grid, sol, fixedField, scale, space });
}

/**
 * The largest factor λ on `variableLoads` before the beam becomes a mechanism, with the fixed
 * loads present, proven by a statically admissible moment field (lower bound) and a mechanism
 * whose virtual work is computed independently (upper bound). Throws if the problem has input
 * errors: validate with `validateCollapseProblem` first.
 * @example solveCollapse({ beam: { spans: [6000], supports: ['pin', 'pin'], joints: [] },
 *   capacity: [{ from: 0, to: 6000, sagging: 100e6, hogging: 100e6 }], fixedLoads: [],
 *   variableLoads: [{ kind: 'point', x: 3000, value: 1000, action: 'temporary' }] }).loadFactor
 * // → 66.667 (W = 4Mp/L = 66.7 kN)
 */
export function solveCollapse(problem: CollapseProblem): CollapseResult {
	assertValidProblem(problem);
	if (measureLoadSize(problem.variableLoads) === 0) {
		return { status: 'unbounded', message: 'There is no variable load to increase.' };
	}
	const { problem: p, scale } = normaliseProblem(problem);
	try {
		const fixedField = findFixedLoadField(p);
		if (fixedField.slack < -1e-12) return reportFixedLoadFailure(fixedField.slack);
		return solveNormalised(p, scale, fixedField);
	} catch (e) {
		// Rounding can defeat the programs on very long beams: say so rather than throw.
		if (isNumericalBreakdown(e)) return reportNotProved(problem);
		throw e;
	}
}
