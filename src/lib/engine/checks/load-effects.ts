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

/** One characteristic load group and its analysis. */
export interface LoadGroup {
	/** `permanent`, `imposed` (with its span) or `temporary`. */
	kind: 'permanent' | 'imposed' | 'temporary';
	/** Characteristic loads of the group (imposed loads cut at the nodes). */
	loads: Load[];
	/** Effect of the group's characteristic loads at x. */
	at(x: number, side: Side): Effect;
	/** Weight of the group in an arrangement (its partial factor, 0 when patterned off). */
	weight(arrangement: LoadArrangement): number;
	/** The group's characteristic analysis. */
	result: ElasticResult;
	/** Span of an imposed group (its loads are patterned span by span). */
	span?: number;
}

/** Analysed groups, plus readers for one arrangement. */
export interface LoadEffects {
	nodes: number[];
	/** Groups with loads; the fixed ones first, the temporary group (if any) last. */
	groups: LoadGroup[];
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
 */
export function analyseLoadGroups(o: {
	beam: BeamLine;
	EI: number[];
	loads: Load[];
	/** Analyses already made, by beam, stiffness and loads (repeated runs reuse them). */
	memo?: Map<string, ElasticResult>;
}): LoadEffects {
	const nodes = [0];
	for (const s of o.beam.spans) nodes.push(nodes[nodes.length - 1] + s);
	const run = (loads: Load[]): ElasticResult | null => {
		if (loads.length === 0) return null;
		const key = o.memo ? JSON.stringify([o.beam, o.EI, loads]) : '';
		const known = o.memo?.get(key);
		if (known) return known;
		const r = analyseElastic({ beam: o.beam, EI: o.EI, loads });
		if (!r.ok) throw new Error('invariant: load groups are analysed only on stable beams');
		o.memo?.set(key, r.value);
		return r.value;
	};
	const byAction = (a: Load['action']) => o.loads.filter((l) => l.action === a);
	const imposedBySpan: Load[][] = o.beam.spans.map(() => []);
	for (const l of byAction('imposed')) {
		for (const piece of splitLoadAtNodes(l, nodes)) {
			imposedBySpan[findSpanIndex(piece, nodes)].push(piece);
		}
	}
	const group = (
		kind: LoadGroup['kind'],
		loads: Load[],
		weight: LoadGroup['weight'],
		span?: number
	) => {
		const result = run(loads);
		if (!result) return null;
		// The checks read the same points many times (every arrangement, every multiplier tried);
		// one map per side keyed by the number itself (no key strings to build).
		const left = new Map<number, Effect>();
		const right = new Map<number, Effect>();
		const at = (x: number, side: Side): Effect => {
			const cache = side === 'left' ? left : right;
			let e = cache.get(x);
			if (!e) {
				const s = result.at(x, side);
				cache.set(x, (e = { M: s.M, V: s.V, w: s.w }));
			}
			return e;
		};
		return { kind, loads, at, weight, result, span };
	};
	const fixed = [
		group('permanent', byAction('permanent'), (a) => a.gammaG),
		...imposedBySpan.map((loads, i) => group('imposed', loads, (a) => a.imposedBySpan[i], i))
	].filter((g) => g !== null);
	const temporary = group('temporary', byAction('temporary'), (a) => a.gammaTemporary);
	const combine = (list: typeof fixed, arr: LoadArrangement, x: number, side: Side): Effect => {
		const e = { M: 0, V: 0, w: 0 };
		for (const g of list) {
			const f = g.weight(arr);
			if (f === 0) continue;
			const v = g.at(x, side);
			e.M += f * v.M;
			e.V += f * v.V;
			e.w += f * v.w;
		}
		return e;
	};
	const reactionsOf = (list: typeof fixed, arr: LoadArrangement) => {
		const out = nodes.map(() => 0);
		for (const g of list) g.result.reactions.forEach((r, n) => (out[n] += g.weight(arr) * r.force));
		return out;
	};
	const variable = temporary ? [temporary] : [];
	return {
		nodes,
		groups: [...fixed, ...variable],
		fixedAt: (arr, x, side = 'right') => combine(fixed, arr, x, side),
		variableAt: (arr, x, side = 'right') => combine(variable, arr, x, side),
		reactions: (arr) => ({ fixed: reactionsOf(fixed, arr), variable: reactionsOf(variable, arr) }),
		characteristic: { temporary: temporary?.result ?? null, all: run(o.loads) }
	};
}
