/**
 * Splits beam-line loads into pieces local to each span (element), and integrates them exactly.
 */
import type { BeamLine, Load } from '../model/types';
import { integrateGauss3 } from './gauss';

/** A load on one element, positions measured from the element's left end (mm), downward +. */
export type ElementLoad =
	| { kind: 'point'; a: number; P: number }
	| { kind: 'line'; a: number; b: number; wa: number; wb: number };

/**
 * Node positions of a beam line, mm, from the left end.
 * @example
 * computeNodePositions({ spans: [6000, 4000], supports: [], joints: [] }) // [0, 6000, 10000]
 */
export function computeNodePositions(beam: BeamLine): number[] {
	const xs = [0];
	for (const L of beam.spans) xs.push(xs[xs.length - 1] + L);
	return xs;
}

/**
 * Distributes loads over the spans. A point load on an internal node goes to the span on its
 * left (its force reaches the node either way); line loads are cut at the nodes.
 */
export function splitLoadsBySpan(beam: BeamLine, loads: Load[]): ElementLoad[][] {
	const nodes = computeNodePositions(beam);
	const out: ElementLoad[][] = beam.spans.map(() => []);
	for (const load of loads) {
		if (load.kind === 'point') {
			const e = findSpanIndex(nodes, load.x);
			out[e].push({ kind: 'point', a: load.x - nodes[e], P: load.value });
			continue;
		}
		const [w0, w1] = load.kind === 'uniform' ? [load.value, load.value] : [load.start, load.end];
		const wAt = (x: number): number =>
			load.to === load.from ? w0 : w0 + ((w1 - w0) * (x - load.from)) / (load.to - load.from);
		for (let e = 0; e < beam.spans.length; e++) {
			const from = Math.max(load.from, nodes[e]);
			const to = Math.min(load.to, nodes[e + 1]);
			if (to <= from) continue;
			const [a, b] = [from - nodes[e], to - nodes[e]];
			out[e].push({ kind: 'line', a, b, wa: wAt(from), wb: wAt(to) });
		}
	}
	return out;
}

/** Index of the span holding x; a node belongs to the span on its left (except x = 0). */
export function findSpanIndex(nodes: number[], x: number): number {
	for (let e = 0; e < nodes.length - 2; e++) if (x <= nodes[e + 1]) return e;
	return nodes.length - 2;
}

/** Line-load intensity of a piece at local position t (inside [a, b]), N/mm. */
export function lineIntensity(load: Extract<ElementLoad, { kind: 'line' }>, t: number): number {
	if (load.b === load.a) return load.wa;
	return load.wa + ((load.wb - load.wa) * (t - load.a)) / (load.b - load.a);
}

/**
 * Σ over the element's loads of ∫ q(t)·g(t) dt for loads at t below `upTo` (point loads count as
 * q = P δ(t − a)). `includeAt` decides whether a point load exactly at `upTo` counts.
 * g must be a polynomial of degree ≤ 4 for the result to be exact.
 */
export function sumLoadIntegral(
	loads: ElementLoad[],
	upTo: number,
	includeAt: boolean,
	g: (t: number) => number
): number {
	let sum = 0;
	for (const load of loads) {
		if (load.kind === 'point') {
			if (load.a < upTo || (includeAt && load.a === upTo)) sum += load.P * g(load.a);
		} else {
			sum += integrateGauss3((t) => lineIntensity(load, t) * g(t), load.a, Math.min(load.b, upTo));
		}
	}
	return sum;
}
