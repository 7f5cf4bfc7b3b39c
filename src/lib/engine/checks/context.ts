/**
 * What every member check reads: the beam, its spans' sections, the load arrangements, the
 * analysed load groups and, on the plastic route, the collapse of each arrangement.
 */
import { shearAt } from '../collapse/index';
import type { Side } from '../elastic/index';
import type { BeamLine, Load } from '../model/types';
import type { ResistanceMultipliers } from './basis-types';
import type { DesignBasis } from './design-basis';
import type { LoadArrangement } from './load-arrangements';
import type { LoadEffects } from './load-effects';
import type { SpanMember } from './member';
import { spanOf, type PlasticArrangement } from './plastic-bending';
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
	/** Nominal to design resistance (the basis's 1/γM, φ or 1/Ω). */
	resistance: ResistanceMultipliers;
	eta: number;
	route: AnalysisRoute;
	/** Collapse per arrangement on the plastic route; empty otherwise. */
	plastic: Map<LoadArrangement, PlasticArrangement>;
	/** The load groups analysed on the released, statically determinate beam. */
	released: LoadEffects;
	/** Buckling energy matrices kept between runs on the same beam (the governing curve). */
	bucklingMemo?: Map<string, Float64Array>;
}

/**
 * The collapse field moved from its load level λ to multiplier t. The free (released-beam) part
 * follows the loads exactly; the redundant part (support moments) is scaled by the ratio of
 * total design load, k = (F_fix + t·F_var)/(F_fix + λ·F_var). With no fixed loads this is the
 * collapse diagram scaled by t/λ; at t = λ it is the collapse field itself.
 * @param collapse value of the collapse field at the point (shear N, or a reaction N)
 * @param free value of the fixed and the variable loads on the released beam
 */
export function shiftCollapseValue(o: {
	collapse: number;
	free: { fixed: number; variable: number };
	totals: { fixed: number; variable: number };
	lambda: number;
	t: number;
}): number {
	const { free, totals, lambda, t } = o;
	const den = totals.fixed + lambda * totals.variable;
	const k = den > 0 ? (totals.fixed + t * totals.variable) / den : 1;
	const redundant = o.collapse - free.fixed - lambda * free.variable;
	return free.fixed + t * free.variable + k * redundant;
}

/** Total design load of an arrangement's fixed and variable loads, N (sum of reactions). */
export function sumArrangementLoads(released: LoadEffects, arr: LoadArrangement) {
	const r = released.reactions(arr);
	const sum = (v: number[]) => v.reduce((a, b) => a + b, 0);
	return { fixed: sum(r.fixed), variable: sum(r.variable) };
}

/**
 * Shear at x for multiplier t: the elastic value and, on the plastic route, the collapse field
 * moved to t (see {@link shiftCollapseValue}).
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
	if (p && 'diagram' in p.result && p.loadFactor !== null) {
		const free = {
			fixed: ctx.released.fixedAt(arr, x, side).V,
			variable: ctx.released.variableAt(arr, x, side).V
		};
		const collapse = shearAt(p.result.diagram, x, side);
		const totals = sumArrangementLoads(ctx.released, arr);
		out.push(shiftCollapseValue({ collapse, free, totals, lambda: p.loadFactor, t }));
	}
	return out;
}

/** Reactions (N, upward +) at multiplier t, elastic and, on the plastic route, from collapse. */
export function readReactions(ctx: CheckContext, arr: LoadArrangement, t: number): number[][] {
	const r = ctx.effects.reactions(arr);
	const out = [r.fixed.map((f, i) => f + t * r.variable[i])];
	const p = ctx.plastic.get(arr);
	if (p && 'reactions' in p.result && p.loadFactor !== null) {
		const c = p.result.reactions;
		const rel = ctx.released.reactions(arr);
		const totals = sumArrangementLoads(ctx.released, arr);
		const lambda = p.loadFactor;
		out.push(
			c.map((collapse, i) => {
				const free = { fixed: rel.fixed[i], variable: rel.variable[i] };
				return shiftCollapseValue({ collapse, free, totals, lambda, t });
			})
		);
	}
	return out;
}

/** Point loads of the case (any action), merged by position, mm. */
export function listPointLoadPositions(loads: Load[]): number[] {
	const xs = loads.flatMap((l) => (l.kind === 'point' ? [l.x] : []));
	return [...new Set(xs)].sort((a, b) => a - b);
}

/** Relative offset that puts a reading just inside a span or just beside a point load. */
const INSIDE = 1e-7;

/**
 * Where shear peaks: just inside both ends of every span and just either side of every point
 * load. Reading a hair away from the jump keeps every analysis on the same side of it.
 */
export function listShearPoints(ctx: CheckContext): { x: number; side: Side; span: number }[] {
	const out: { x: number; side: Side; span: number }[] = [];
	ctx.beam.spans.forEach((L, i) => {
		out.push({ x: ctx.nodes[i] + INSIDE * L, side: 'right', span: i });
		out.push({ x: ctx.nodes[i + 1] - INSIDE * L, side: 'left', span: i });
	});
	const total = ctx.nodes[ctx.nodes.length - 1];
	for (const x of listPointLoadPositions(ctx.loads)) {
		const span = spanOf(ctx.nodes, x);
		const d = INSIDE * ctx.beam.spans[span];
		if (x - d > 0) out.push({ x: x - d, side: 'left', span });
		if (x + d < total) out.push({ x: x + d, side: 'right', span: spanOf(ctx.nodes, x + d) });
	}
	return out;
}
