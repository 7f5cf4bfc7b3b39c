/**
 * What every member check reads: the beam, its spans' sections, the load arrangements, the
 * analysed load groups and, on the plastic route, the collapse of each arrangement.
 */
import { shearAt } from '../collapse/index';
import type { ElasticResult, Side } from '../elastic/index';
import type { BeamLine, Load } from '../model/types';
import type { DesignBasis } from './design-basis';
import type { LoadArrangement } from './load-arrangements';
import type { LoadEffects } from './load-effects';
import type { SpanMember } from './member';
import type { PlasticArrangement } from './plastic-bending';
import type { AnalysisRoute } from './types';

/** Shared inputs of the member checks. */
export interface CheckContext {
	basis: DesignBasis<unknown>;
	beam: BeamLine;
	/** Node positions, mm. */
	nodes: number[];
	members: SpanMember[];
	/** Characteristic loads (self weight included), internal units. */
	loads: Load[];
	arrangements: LoadArrangement[];
	effects: LoadEffects;
	gammaM0: number;
	gammaM1: number;
	eta: number;
	route: AnalysisRoute;
	/** Collapse per arrangement on the plastic route; empty otherwise. */
	plastic: Map<LoadArrangement, PlasticArrangement>;
	/** Temporary loads (characteristic) on the released, determinate beam. */
	released: ElasticResult | null;
}

/**
 * Shear at x for multiplier t: the elastic value, and on the plastic route also the collapse
 * field brought from λ back to t along the released beam, V_c − (λ − t)·γT·V_released.
 * @returns the values that apply (one or two), N
 */
export function readShears(
	ctx: CheckContext,
	arr: LoadArrangement,
	x: number,
	side: Side,
	t: number
): number[] {
	const out = [ctx.effects.fixedAt(arr, x, side).V + t * ctx.effects.variableAt(arr, x, side).V];
	const p = ctx.plastic.get(arr);
	if (p && 'diagram' in p.result && p.loadFactor !== null && ctx.released) {
		const rel = ctx.released.at(x, side).V * arr.gammaTemporary;
		out.push(shearAt(p.result.diagram, x, side) - (p.loadFactor - t) * rel);
	}
	return out;
}

/** Reactions (N, upward +) at multiplier t, elastic and, on the plastic route, from collapse. */
export function readReactions(ctx: CheckContext, arr: LoadArrangement, t: number): number[][] {
	const r = ctx.effects.reactions(arr);
	const out = [r.fixed.map((f, i) => f + t * r.variable[i])];
	const p = ctx.plastic.get(arr);
	if (p && 'reactions' in p.result && p.loadFactor !== null && ctx.released) {
		const c = p.result.reactions;
		const lambda = p.loadFactor;
		const gammaT = arr.gammaTemporary;
		out.push(ctx.released.reactions.map((n, i) => c[i] - (lambda - t) * n.force * gammaT));
	}
	return out;
}

/** Point loads of the case (any action), merged by position, mm. */
export function listPointLoadPositions(loads: Load[]): number[] {
	const xs = loads.flatMap((l) => (l.kind === 'point' ? [l.x] : []));
	return [...new Set(xs)].sort((a, b) => a - b);
}
