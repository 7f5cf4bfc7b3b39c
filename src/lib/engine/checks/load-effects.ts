/**
 * Elastic load effects of the characteristic load groups, analysed once and combined linearly
 * for every load arrangement: permanent, imposed span by span, and temporary. Elastic analysis
 * is linear, so an arrangement's fixed effect is γG·E(G) + Σ γQ,i·E(Q,i) and its variable
 * effect γT·E(T).
 */
import { analyseElastic } from '../elastic/index';
import type { ElasticResult, Side } from '../elastic/index';
import type { BeamLine, Load } from '../model/types';
import { findSpanIndex, splitLoadAtNodes } from './factor-loads';
import type { LoadArrangement } from './load-arrangements';

/** Moment, shear and deflection at a point. */
export interface Effect {
	M: number;
	V: number;
	w: number;
}

/** Analysed groups, plus readers for one arrangement. */
export interface LoadEffects {
	nodes: number[];
	/** Effect of an arrangement's fixed loads at x. */
	fixedAt(arrangement: LoadArrangement, x: number, side?: Side): Effect;
	/** Effect of an arrangement's factored temporary loads at x (× the multiplier later). */
	variableAt(arrangement: LoadArrangement, x: number, side?: Side): Effect;
	/** Support reactions (N, upward +) of the fixed and the variable loads. */
	reactions(arrangement: LoadArrangement): { fixed: number[]; variable: number[] };
	/** Unfactored results: temporary loads alone, and all loads. */
	characteristic: { temporary: ElasticResult | null; all: ElasticResult | null };
}

/**
 * Analyses each load group once.
 * @param o.EI bending stiffness per span, N·mm²
 * @returns null when the beam is a mechanism (input validation reports that first)
 */
export function analyseLoadGroups(o: { beam: BeamLine; EI: number[]; loads: Load[] }): LoadEffects | null {
	const nodes = [0];
	for (const s of o.beam.spans) nodes.push(nodes[nodes.length - 1] + s);
	const run = (loads: Load[]): ElasticResult | null => {
		if (loads.length === 0) return null;
		const r = analyseElastic({ beam: o.beam, EI: o.EI, loads });
		if (!r.ok) throw new Error('invariant: load groups are analysed only on stable beams');
		return r.value;
	};
	const byAction = (a: Load['action']) => o.loads.filter((l) => l.action === a);
	const imposedBySpan: Load[][] = o.beam.spans.map(() => []);
	for (const l of byAction('imposed')) {
		for (const piece of splitLoadAtNodes(l, nodes)) imposedBySpan[findSpanIndex(piece, nodes)].push(piece);
	}
	const permanent = run(byAction('permanent'));
	const imposed = imposedBySpan.map(run);
	const temporary = run(byAction('temporary'));
	const zero: Effect = { M: 0, V: 0, w: 0 };
	const read = (r: ElasticResult | null, x: number, side: Side): Effect => {
		if (!r) return zero;
		const s = r.at(x, side);
		return { M: s.M, V: s.V, w: s.w };
	};
	const add = (a: Effect, b: Effect, f: number): Effect => ({
		M: a.M + f * b.M,
		V: a.V + f * b.V,
		w: a.w + f * b.w
	});
	const reactionsOf = (r: ElasticResult | null) => (r ? r.reactions.map((n) => n.force) : nodes.map(() => 0));
	return {
		nodes,
		fixedAt(arr, x, side = 'right') {
			let e = add(zero, read(permanent, x, side), arr.gammaG);
			imposed.forEach((r, i) => {
				if (arr.imposedBySpan[i] > 0) e = add(e, read(r, x, side), arr.imposedBySpan[i]);
			});
			return e;
		},
		variableAt: (arr, x, side = 'right') => add(zero, read(temporary, x, side), arr.gammaTemporary),
		reactions(arr) {
			const fixed = reactionsOf(permanent).map((v) => v * arr.gammaG);
			imposed.forEach((r, i) => {
				const f = arr.imposedBySpan[i];
				if (f > 0) reactionsOf(r).forEach((v, n) => (fixed[n] += f * v));
			});
			return { fixed, variable: reactionsOf(temporary).map((v) => v * arr.gammaTemporary) };
		},
		characteristic: { temporary, all: run(o.loads) }
	};
}
