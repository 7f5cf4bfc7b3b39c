/**
 * The plastic route for one load arrangement: exact collapse factor on the temporary loads,
 * with the hinge capacity reduced where the shear at a hinge exceeds half the plastic shear
 * resistance (EN 1993-1-1 6.2.8).
 *
 * The reduction depends on the shear, which grows with the load factor, so the answer is the
 * fixed point λ* = G(λ*), where G(λ) is the collapse factor with every hinge reduced for the
 * shear at load level λ. G does not increase with λ, so λ/G(λ) rises through 1 exactly once and
 * the fixed point is found by the bracketed root search.
 */
import {
	measureFixedLoadMargin,
	shearAt,
	solveCollapse,
	solveCollapseLoadFactor,
	type CollapseResult
} from '../collapse/index';
import type { BeamLine, CapacitySegment, Load } from '../model/types';
import { keepsFixedLoadField, reduceCapacity } from './capacity';
import type { ResistanceMultipliers } from './basis-types';
import type { DesignBasis } from './design-basis';
import type { LoadArrangement } from './load-arrangements';
import type { LoadEffects } from './load-effects';
import type { SpanMember } from './member';
import { findMultiplierAtCapacity } from './root-find';
import { shiftCollapseValue, sumArrangementLoads } from './context';

/** A hinge whose capacity was reduced for shear. */
export interface HingeReduction {
	x: number;
	vEd: number;
	vplRd: number;
	rho: number;
	myVRd: number;
}

/** Collapse of one arrangement. */
export interface PlasticArrangement {
	arrangement: LoadArrangement;
	result: CollapseResult;
	/** λ on the temporary loads: 0 when the fixed loads fail, null when unbounded. */
	loadFactor: number | null;
	certified: boolean;
	capacity: CapacitySegment[];
	reductions: HingeReduction[];
}

/** Inputs of {@link solvePlasticArrangement}. */
export interface PlasticArrangementInput {
	basis: DesignBasis<unknown>;
	beam: BeamLine;
	members: SpanMember[];
	nodes: number[];
	capacity: CapacitySegment[];
	arrangement: LoadArrangement;
	fixedLoads: Load[];
	variableLoads: Load[];
	effects: LoadEffects;
	/** The load groups analysed on the released, statically determinate beam. */
	released: LoadEffects;
	/** Plastic shear resistance per span, N (null where unknown). */
	vplRd: (number | null)[];
	resistance: ResistanceMultipliers;
}

/** Solves one arrangement with the shear reduction at its fixed point. */
export function solvePlasticArrangement(o: PlasticArrangementInput): PlasticArrangement {
	const plain = solve(o, o.capacity);
	const pack = (
		result: CollapseResult,
		capacity: CapacitySegment[],
		reductions: HingeReduction[],
		factor = factorOf(result)
	) => ({
		arrangement: o.arrangement,
		result,
		loadFactor: factor,
		certified: result.status === 'mechanism' ? result.certified : result.status !== 'not-certified',
		capacity,
		reductions
	});
	if (plain.status === 'unbounded' && o.variableLoads.every(isZeroLoad)) {
		// A combination without the temporary load (ASCE 7 1.4D): the fixed loads alone decide,
		// and a collapse under them must not read as "unbounded".
		const { beam, fixedLoads } = o;
		const alone = solveCollapse({
			beam,
			capacity: o.capacity,
			fixedLoads,
			variableLoads: fixedLoads
		});
		if (alone.status === 'fails-under-fixed') return pack(alone, o.capacity, []);
	}
	if (plain.status !== 'mechanism') return pack(plain, o.capacity, []);
	const reduceAt = (lambda: number) => {
		const reductions = findReductions(o, plain, lambda);
		const capacity = reductions.reduce((cap, r) => {
			const half = o.members[spanOf(o.nodes, r.x)].h / 2;
			return reduceCapacity(cap, { from: r.x - half, to: r.x + half, value: r.myVRd });
		}, o.capacity);
		return { reductions, capacity };
	};
	const at = (lambda: number) => {
		const { reductions, capacity } = reduceAt(lambda);
		return { reductions, capacity, result: reductions.length ? solve(o, capacity) : plain };
	};
	// The search needs only λ of each trial (G below); the answer is solved and certified in full.
	let margin: number | undefined;
	const factorAt = (lambda: number) => {
		const { reductions, capacity } = reduceAt(lambda);
		if (reductions.length === 0) return plain.loadFactor;
		const { beam, fixedLoads, variableLoads } = o;
		margin ??= measureFixedLoadMargin({ beam, capacity: o.capacity, fixedLoads, variableLoads });
		const fixedLoadsFit = keepsFixedLoadField(o.capacity, capacity, margin);
		return solveCollapseLoadFactor(
			{ beam, capacity, fixedLoads, variableLoads },
			{ fixedLoadsFit }
		);
	};
	if (reduceAt(plain.loadFactor).reductions.length === 0) return pack(plain, o.capacity, []);
	// G does not increase, so λ* = G(λ*) lies in [G(λ0), λ0]: search from G(λ0) upward.
	const g0 = factorAt(plain.loadFactor) ?? plain.loadFactor;
	const span = plain.loadFactor - g0;
	const step =
		span > 0
			? findMultiplierAtCapacity({
					utilisation: (d) => {
						const g = factorAt(g0 + d) ?? Number.MAX_VALUE;
						return g > 0 ? (g0 + d) / g : Number.MAX_VALUE;
					},
					upperLimit: span,
					start: span,
					tolerance: 1e-7
				})
			: 0;
	const lambda = g0 + (step ?? span);
	const final = at(lambda);
	// λ is the safe side of the bracket: G(λ) ≥ λ, within the tolerance of the fixed point.
	const g = factorOf(final.result);
	const factor = g === null ? null : Math.min(g, lambda);
	return pack(final.result, final.capacity, final.reductions, factor);
}

/** True for a load of zero size (a load group weighted 0 in an arrangement). */
function isZeroLoad(l: Load): boolean {
	return l.kind === 'linear' ? l.start === 0 && l.end === 0 : l.value === 0;
}

/** λ of a result: 0 when the fixed loads fail, null when unbounded. */
function factorOf(r: CollapseResult): number | null {
	return r.status === 'fails-under-fixed' ? 0 : r.status === 'unbounded' ? null : r.loadFactor;
}

function solve(o: PlasticArrangementInput, capacity: CapacitySegment[]): CollapseResult {
	const { beam, fixedLoads, variableLoads } = o;
	return solveCollapse({ beam, capacity, fixedLoads, variableLoads });
}

/** Offset from a hinge to read the shear on either side of it, relative to the span. */
const SIDE = 1e-7;

/**
 * Shear at each hinge of the plain mechanism at load level λ: the larger of the elastic shear
 * and the collapse field moved to λ (context.ts, shiftCollapseValue).
 * ρ is capped at 1 (VEd ≥ Vpl,Rd is the shear check's failure, not a negative moment).
 */
function findReductions(
	o: PlasticArrangementInput,
	r: Extract<CollapseResult, { status: 'mechanism' }>,
	lambda: number
): HingeReduction[] {
	const out: HingeReduction[] = [];
	const L = o.nodes[o.nodes.length - 1];
	const totals = sumArrangementLoads(o.released, o.arrangement);
	for (const hinge of r.hinges) {
		const span = spanOf(o.nodes, hinge.x);
		const vplRd = o.vplRd[span];
		const m = o.members[span];
		if (vplRd === null || !m.propsKnown) continue;
		let vEd = 0;
		for (const side of ['left', 'right'] as const) {
			const x = hinge.x + (side === 'left' ? -SIDE : SIDE) * L;
			if (x <= 0 || x >= L) continue;
			const { fixedAt, variableAt } = o.effects;
			const el = fixedAt(o.arrangement, x, side).V + lambda * variableAt(o.arrangement, x, side).V;
			const free = {
				fixed: o.released.fixedAt(o.arrangement, x, side).V,
				variable: o.released.variableAt(o.arrangement, x, side).V
			};
			const collapse = shearAt(r.diagram, x, side);
			const pl = shiftCollapseValue({ collapse, free, totals, lambda: r.loadFactor, t: lambda });
			vEd = Math.max(vEd, Math.abs(el), Math.abs(pl));
		}
		const rho = Math.min(1, o.basis.computeShearReduction({ vEd, vplRd }));
		if (rho <= 0) continue;
		const myVRd = o.basis.computeReducedMomentResistance({
			Wpl: m.Wpl,
			Aw: m.hw * m.tw,
			tw: m.tw,
			fy: m.fy,
			resistance: o.resistance,
			rho
		});
		out.push({ x: hinge.x, vEd, vplRd, rho, myVRd });
	}
	return out;
}

/** Span index holding x (a node belongs to the span on its left, the first node to span 0). */
export function spanOf(nodes: number[], x: number): number {
	for (let i = 1; i < nodes.length; i++) if (x <= nodes[i] + 1e-9) return i - 1;
	return nodes.length - 2;
}
