/**
 * Turns the optimal static field into a CollapseResult: bounds, hinges, mechanism name, diagram
 * and reactions, all scaled back to N, mm and N·mm.
 */
import { assertFinite } from '../model/issue';
import { computeEquilibriumResidual, computeLowerBound, computeUpperBound } from './certify';
import { cleanField } from './clean-field';
import { sampleDiagram, scaleDiagram } from './diagram';
import type { StaticSolution } from './lower-bound';
import { consolidateHinges, makeCompatible } from './hinge-set';
import { findMovingSpans, nameMechanism, readHinges } from './mechanism';
import type { ProblemScale } from './normalise';
import type { SolutionSpace } from './nullspace';
import { evaluateMoment, type FieldModel } from './statics';
import type { Interval, Station } from './stations';
import type { CollapseResult, Hinge } from './types';

/** Bounds must agree to this relative gap for a certified answer. */
export const CERTIFY_GAP = 1e-6;
/** Largest equilibrium or compatibility error accepted in a certificate (relative). */
const RESIDUAL_LIMIT = 1e-9;

/** Assembles the certified result from the optimal field `sol`. */
export function certifyField(options: {
	model: FieldModel;
	grid: { stations: Station[]; intervals: Interval[] };
	sol: Extract<StaticSolution, { status: 'optimal' }>;
	fixedField: { z: number[]; slack: number };
	scale: ProblemScale;
	space: SolutionSpace;
}): CollapseResult {
	const { model, grid, sol, fixedField, scale, space } = options;
	const lambdaN = Math.max(0, sol.z[model.lambdaIndex]);
	const raw = readHinges(sol.points, sol.duals);
	const merged = consolidateHinges({ model, z: sol.z, ...grid, raw });
	const kinks = makeCompatible(model.beam, merged).filter((h) => h.rotation !== 0);
	const { upperBound, displacement } = computeUpperBound({ model, hinges: kinks });
	const spans = findMovingSpans(model.beam, displacement);
	let lower = computeLowerBound({ model, grid, z1: sol.z, lambda1: lambdaN, z0: fixedField.z });
	// Only when rounding left the bounds apart is a cleaner field worth another program.
	if (lower < lambdaN * (1 - 1e-13)) {
		const cleaned = cleanField({
			model,
			space,
			grid,
			points: sol.points,
			lambda: lambdaN,
			movingSpans: spans
		});
		const lambda1 = cleaned ? Math.max(0, cleaned[model.lambdaIndex]) : 0;
		if (cleaned)
			lower = Math.max(
				lower,
				computeLowerBound({ model, grid, z1: cleaned, lambda1, z0: fixedField.z })
			);
	}
	const gap = Number.isFinite(upperBound)
		? Math.abs(upperBound - lower) / Math.max(Math.abs(upperBound), 1e-300)
		: 1;
	const equilibriumResidual = computeEquilibriumResidual(model, sol.z);
	const mechanism = nameMechanism(model.beam, kinks, spans);
	const largest = Math.max(...kinks.map((h) => Math.abs(h.rotation)));
	const hinges: Hinge[] = kinks.map((h) => ({
		x: assertFinite(h.x * scale.length, 'hinge x'),
		moment: assertFinite(
			evaluateMoment(model, sol.z, h.x, h.side as 1 | -1) * scale.moment,
			'hinge moment'
		),
		rotation: assertFinite(h.rotation / largest, 'hinge rotation')
	}));
	const reactions = model.beam.supports.map(() => 0);
	model.unknowns.forEach((u, i) => {
		if (u.kind === 'reaction') reactions[u.node] = assertFinite(sol.z[i] * scale.force, 'reaction');
	});
	const diagram = scaleDiagram(sampleDiagram({ model, z: sol.z, ...grid }), scale);
	diagram.M.forEach((v) => assertFinite(v, 'diagram moment'));
	diagram.V.forEach((v) => assertFinite(v, 'diagram shear'));
	const ub = Number.isFinite(upperBound) ? upperBound : lambdaN;
	const solution = {
		loadFactor: assertFinite(lambdaN * scale.lambda, 'load factor'),
		lowerBound: assertFinite(lower * scale.lambda, 'lower bound'),
		upperBound: assertFinite(ub * scale.lambda, 'upper bound'),
		gap: assertFinite(gap, 'gap'),
		hinges,
		mechanism,
		diagram,
		reactions,
		equilibriumResidual: assertFinite(equilibriumResidual, 'equilibrium residual')
	};
	const problems: string[] = [];
	if (!(gap <= CERTIFY_GAP))
		problems.push(`the bounds differ by ${gap.toExponential(2)} (relative)`);
	if (equilibriumResidual > RESIDUAL_LIMIT) problems.push('the moment field is not in equilibrium');
	if (displacement.compatibilityError > RESIDUAL_LIMIT)
		problems.push('the mechanism does not fit the supports');
	if (problems.length === 0) return { status: 'mechanism', certified: true, ...solution };
	return {
		status: 'not-certified',
		certified: false,
		message: `No certified answer: ${problems.join('; ')}. Do not rely on this load factor.`,
		...solution
	};
}
