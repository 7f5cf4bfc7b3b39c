/**
 * The plastic route for one load arrangement: exact collapse factor on the temporary loads,
 * with the hinge capacity reduced where the shear at a hinge exceeds half the plastic shear
 * resistance (EN 1993-1-1 6.2.8), recomputed until the reductions stop changing.
 */
import { shearAt, solveCollapse, type CollapseResult } from '../collapse/index';
import type { BeamLine, CapacitySegment, Load } from '../model/types';
import { reduceCapacity } from './capacity';
import type { DesignBasis } from './design-basis';
import type { LoadArrangement } from './load-arrangements';
import type { LoadEffects } from './load-effects';
import type { SpanMember } from './member';

/** Rounds of "reduce, then solve again"; a handful settle to round-off in practice. */
const MAX_ROUNDS = 12;

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
	/** Plastic shear resistance per span, N (null where unknown). */
	vplRd: (number | null)[];
	gammaM0: number;
}

/** Solves one arrangement with the shear reduction iterated to a fixed point. */
export function solvePlasticArrangement(o: PlasticArrangementInput): PlasticArrangement {
	let capacity = o.capacity;
	let reductions: HingeReduction[] = [];
	let result = solve(o, capacity);
	// The reduction depends on the shear at collapse, which depends on λ: iterate λ → shear →
	// My,V,Rd → λ. Should the hinges keep moving, the smallest λ seen is kept (conservative).
	let best = { result, capacity, reductions };
	for (let round = 0; round < MAX_ROUNDS && result.status === 'mechanism'; round++) {
		const next = findReductions(o, result);
		if (next.length === 0) break;
		const nextCapacity = next.reduce((cap, r) => {
			const half = o.members[spanOf(o.nodes, r.x)].h / 2;
			return reduceCapacity(cap, { from: r.x - half, to: r.x + half, value: r.myVRd });
		}, o.capacity);
		const nextResult = solve(o, nextCapacity);
		const before = factorOf(result);
		const after = factorOf(nextResult);
		const settled = after !== null && before !== null && Math.abs(after - before) <= 1e-9 * after;
		[result, capacity, reductions] = [nextResult, nextCapacity, next];
		const bestFactor = factorOf(best.result) ?? Infinity;
		if (round === 0 || settled || (after ?? Infinity) < bestFactor) {
			best = { result, capacity, reductions };
		}
		if (settled) break;
	}
	({ result, capacity, reductions } = best);
	return {
		arrangement: o.arrangement,
		result,
		loadFactor: factorOf(result),
		certified: result.status === 'mechanism' ? result.certified : result.status !== 'not-certified',
		capacity,
		reductions
	};
}

/** λ of a result: 0 when the fixed loads fail, null when unbounded. */
function factorOf(r: CollapseResult): number | null {
	return r.status === 'fails-under-fixed' ? 0 : r.status === 'unbounded' ? null : r.loadFactor;
}

function solve(o: PlasticArrangementInput, capacity: CapacitySegment[]): CollapseResult {
	const { beam, fixedLoads, variableLoads } = o;
	return solveCollapse({ beam, capacity, fixedLoads, variableLoads });
}

/**
 * Shear at each hinge at collapse (multiplier λ): the larger of the collapse field's shear and
 * the elastic shear under the same loads. Evaluating it at λ, not at 1, makes λ itself the
 * largest temporary-load multiplier the reduced hinges allow.
 */
function findReductions(
	o: PlasticArrangementInput,
	r: Extract<CollapseResult, { status: 'mechanism' }>
): HingeReduction[] {
	const out: HingeReduction[] = [];
	const L = o.nodes[o.nodes.length - 1];
	for (const hinge of r.hinges) {
		const span = spanOf(o.nodes, hinge.x);
		const vplRd = o.vplRd[span];
		const m = o.members[span];
		if (vplRd === null || !m.propsKnown) continue;
		let vEd = 0;
		for (const side of ['left', 'right'] as const) {
			if ((side === 'left' && hinge.x <= 0) || (side === 'right' && hinge.x >= L)) continue;
			const el =
				o.effects.fixedAt(o.arrangement, hinge.x, side).V +
				r.loadFactor * o.effects.variableAt(o.arrangement, hinge.x, side).V;
			const pl = shearAt(r.diagram, hinge.x, side);
			vEd = Math.max(vEd, Math.abs(el), Math.abs(pl));
		}
		const rho = o.basis.computeShearReduction({ vEd, vplRd });
		if (rho <= 0) continue;
		const myVRd = o.basis.computeReducedMomentResistance({
			Wpl: m.Wpl,
			Aw: m.hw * m.tw,
			tw: m.tw,
			fy: m.fy,
			gammaM0: o.gammaM0,
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
