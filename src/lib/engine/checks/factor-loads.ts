/**
 * Turns characteristic loads into design loads for one load arrangement: fixed loads (permanent
 * and existing imposed, factored) and variable loads (temporary, factored; the collapse load
 * factor and the temporary-load multiplier scale these only).
 */
import type { Load } from '../model/types';
import type { LoadArrangement } from './load-arrangements';

/** Design loads of one arrangement, N and N/mm. */
export interface DesignLoads {
	fixed: Load[];
	variable: Load[];
}

/**
 * Splits a distributed load at the given node positions, so each piece lies in one span.
 * Point loads come back unchanged.
 */
export function splitLoadAtNodes(load: Load, nodes: number[]): Load[] {
	if (load.kind === 'point') return [load];
	const cuts = nodes.filter((x) => x > load.from && x < load.to);
	if (cuts.length === 0) return [load];
	const edges = [load.from, ...cuts, load.to];
	const at = (x: number) =>
		load.kind === 'linear'
			? load.start + ((load.end - load.start) * (x - load.from)) / (load.to - load.from)
			: load.value;
	return edges.slice(1).map((to, i) => {
		const from = edges[i];
		return load.kind === 'linear'
			? { ...load, from, to, start: at(from), end: at(to) }
			: { ...load, from, to };
	});
}

/** Index of the span holding a load piece (by its midpoint, or its position for a point load). */
export function findSpanIndex(load: Load, nodes: number[]): number {
	const x = load.kind === 'point' ? load.x : (load.from + load.to) / 2;
	for (let i = 1; i < nodes.length; i++) if (x <= nodes[i]) return i - 1;
	return nodes.length - 2;
}

/** Scales a load's intensity by a factor. */
export function scaleLoad(load: Load, factor: number): Load {
	if (load.kind === 'linear') {
		return { ...load, start: load.start * factor, end: load.end * factor };
	}
	return { ...load, value: load.value * factor };
}

/**
 * Applies an arrangement's factors to characteristic loads.
 * @param options.spans span lengths, mm (overhangs included)
 * @example
 * applyArrangement({ loads, spans: [6000], arrangement }).variable // temporary loads × γT
 */
export function applyArrangement(options: {
	loads: Load[];
	spans: number[];
	arrangement: LoadArrangement;
}): DesignLoads {
	const { loads, spans, arrangement } = options;
	const nodes = [0];
	for (const s of spans) nodes.push(nodes[nodes.length - 1] + s);
	const fixed: Load[] = [];
	const variable: Load[] = [];
	for (const load of loads) {
		if (load.action === 'temporary') {
			variable.push(scaleLoad(load, arrangement.gammaTemporary));
		} else if (load.action === 'permanent') {
			fixed.push(scaleLoad(load, arrangement.gammaG));
		} else {
			for (const piece of splitLoadAtNodes(load, nodes)) {
				const f = arrangement.imposedBySpan[findSpanIndex(piece, nodes)] ?? 0;
				if (f > 0) fixed.push(scaleLoad(piece, f));
			}
		}
	}
	return { fixed, variable };
}
