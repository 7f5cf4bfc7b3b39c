/**
 * Elastic analysis of a beam line by the stiffness method, with exact fields inside each span.
 */
import { assertFinite, type Checked } from '../model/issue';
import type { BeamLine } from '../model/types';
import { computeNodePositions, splitLoadsBySpan } from './element-loads';
import { readElement, type ElementData } from './element-field';
import { findMaxDeflections, findMaxMoments, sampleDiagram } from './read-results';
import { findMechanismIssues } from './mechanism';
import { solveStiffness } from './stiffness';
import type { ElasticInput, ElasticResult, ElasticState, NodeReaction, Side } from './types';

/**
 * Analyses a beam line elastically (small deflections, Euler–Bernoulli, no shear deformation).
 * Returns issues instead of a result when the beam is a mechanism.
 * @param input beam (mm), EI per span (N·mm²), loads (N, N/mm, downward +)
 * @example
 * const r = analyseElastic({
 *   beam: { spans: [6000], supports: ['pin', 'pin'], joints: [] },
 *   EI: [210000 * 8.5e7],
 *   loads: [{ kind: 'uniform', from: 0, to: 6000, value: 4, action: 'permanent' }]
 * });
 * r.ok && r.value.maxDeflection.overall.value // 5wL⁴/384EI ≈ 3.78 mm
 */
export function analyseElastic(input: ElasticInput): Checked<ElasticResult> {
	const { beam, EI, loads } = input;
	assertBeamShape(beam, EI);
	const issues = findMechanismIssues(beam);
	if (issues.length > 0) return { ok: false, issues };
	const pieces = splitLoadsBySpan(beam, loads);
	const solution = solveStiffness(beam, EI, pieces);
	if (!solution) throw new Error('invariant: stiffness matrix singular for a stable beam line');
	const nodes = computeNodePositions(beam);
	const elements: ElementData[] = beam.spans.map((L, e) => ({
		L,
		EI: EI[e],
		loads: pieces[e],
		displacements: solution.endDisplacements[e],
		forces: solution.endForces[e]
	}));
	const at = (x: number, side: Side = 'right'): ElasticState => {
		const { e, s, sideUsed } = locate(nodes, x, side);
		const st = readElement(elements[e], s, sideUsed);
		return { x: nodes[e] + s, V: st.V, M: st.M, w: st.w, slope: st.slope };
	};
	const reactions = collectReactions(beam, nodes, solution, elements);
	// Drawn and summarised on first read: the checks analyse many load groups and read most of
	// them only through `at` and the reactions.
	let diagram: ElasticResult['diagram'] | undefined;
	let maxMoment: ElasticResult['maxMoment'] | undefined;
	let maxDeflection: ElasticResult['maxDeflection'] | undefined;
	return {
		ok: true,
		warnings: [],
		value: {
			reactions,
			at,
			get diagram() {
				return (diagram ??= sampleDiagram(nodes, elements));
			},
			get maxMoment() {
				return (maxMoment ??= findMaxMoments(nodes, elements));
			},
			get maxDeflection() {
				return (maxDeflection ??= findMaxDeflections(nodes, elements));
			}
		}
	};
}

function assertBeamShape(beam: BeamLine, EI: number[]): void {
	const n = beam.spans.length;
	if (n < 1 || beam.supports.length !== n + 1 || beam.joints.length !== Math.max(0, n - 1))
		throw new Error('invariant: beam line needs n spans, n + 1 supports and n − 1 joints');
	if (EI.length !== n || EI.some((v) => !(v > 0) || !Number.isFinite(v)))
		throw new Error('invariant: EI must be one positive finite value per span');
	if (beam.spans.some((L) => !(L > 0) || !Number.isFinite(L)))
		throw new Error('invariant: spans must be positive and finite');
}

/** Element index and local position of x; at a node `side` picks the element. */
function locate(nodes: number[], x: number, side: Side): { e: number; s: number; sideUsed: Side } {
	const last = nodes.length - 2;
	const xc = Math.min(Math.max(x, 0), nodes[last + 1]);
	for (let e = 0; e <= last; e++) {
		const atEnd = xc === nodes[e + 1];
		if (xc < nodes[e + 1] || (atEnd && (side === 'left' || e === last)))
			return { e, s: xc - nodes[e], sideUsed: atEnd ? 'left' : side };
	}
	return { e: last, s: nodes[last + 1] - nodes[last], sideUsed: 'left' };
}

function collectReactions(
	beam: BeamLine,
	nodes: number[],
	sol: NonNullable<ReturnType<typeof solveStiffness>>,
	elements: ElementData[]
): NodeReaction[] {
	return nodes.map((x, i) => {
		const sides: [number, number][] = [];
		if (i > 0) sides.push([i - 1, 2]);
		if (i < beam.spans.length) sides.push([i, 0]);
		let force = 0;
		let moment = 0;
		for (const [e, k] of sides) {
			if (sol.restrained.has(sol.dofs[e][k])) force += sol.endForces[e][k];
			if (sol.restrained.has(sol.dofs[e][k + 1])) moment += sol.endForces[e][k + 1];
		}
		const beamMoment =
			i > 0
				? readElement(elements[i - 1], elements[i - 1].L, 'left').M
				: readElement(elements[0], 0, 'right').M;
		return {
			node: i,
			x,
			force: assertFinite(force, 'reaction'),
			moment: assertFinite(moment, 'reaction moment'),
			beamMoment: assertFinite(beamMoment, 'support moment')
		};
	});
}
