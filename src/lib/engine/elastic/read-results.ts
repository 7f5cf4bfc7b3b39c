/**
 * Sampled diagrams and located extremes of a solved beam line, read from the exact element fields.
 */
import { assertFinite } from '../model/issue';
import { listBreakpoints, readElement, type ElementData } from './element-field';
import { findAbsoluteExtreme, listMomentCandidates } from './extremes';
import type { ElasticDiagramPoint, ElasticResult, LocatedValue, Side } from './types';

/** Sample intervals per span in the diagram, besides the load breakpoints. */
const DIAGRAM_SAMPLES = 24;

/**
 * Diagram sampled at the breakpoints of each span (both sides of jumps) and at even steps.
 */
export function sampleDiagram(nodes: number[], elements: ElementData[]): ElasticDiagramPoint[] {
	const out: ElasticDiagramPoint[] = [];
	elements.forEach((el, e) => {
		const xs = new Set(listBreakpoints(el));
		for (let k = 1; k < DIAGRAM_SAMPLES; k++) xs.add((el.L * k) / DIAGRAM_SAMPLES);
		for (const s of [...xs].sort((a, b) => a - b)) {
			const sides: Side[] = s === 0 ? ['right'] : s === el.L ? ['left'] : ['left', 'right'];
			for (const side of sides) {
				const st = readElement(el, s, side);
				const prev = out[out.length - 1];
				const point = { x: nodes[e] + s, V: st.V, M: st.M, w: st.w };
				if (prev && prev.x === point.x && prev.V === point.V && prev.M === point.M) continue;
				out.push(point);
			}
		}
	});
	for (const p of out) for (const v of [p.x, p.V, p.M, p.w]) assertFinite(v, 'diagram value');
	return out;
}

/** Largest sagging and hogging moments over all spans, with positions (mm, N·mm). */
export function findMaxMoments(
	nodes: number[],
	elements: ElementData[]
): ElasticResult['maxMoment'] {
	let hi: LocatedValue = { x: 0, value: -Infinity };
	let lo: LocatedValue = { x: 0, value: Infinity };
	elements.forEach((el, e) => {
		const field = {
			L: el.L,
			breakpoints: listBreakpoints(el),
			read: (s: number, side: Side) => readElement(el, s, side)
		};
		for (const c of listMomentCandidates(field)) {
			if (c.M > hi.value) hi = { x: nodes[e] + c.s, value: c.M };
			if (c.M < lo.value) lo = { x: nodes[e] + c.s, value: c.M };
		}
	});
	// Round-off at a pin is not a moment: ignore values below 1e-9 of the largest.
	const tol = 1e-9 * Math.max(Math.abs(hi.value), Math.abs(lo.value));
	return {
		maxSagging: hi.value > tol ? { x: hi.x, value: assertFinite(hi.value, 'max moment') } : null,
		maxHogging: lo.value < -tol ? { x: lo.x, value: assertFinite(lo.value, 'min moment') } : null
	};
}

/** Largest deflection magnitude per span and overall (mm, downward positive). */
export function findMaxDeflections(
	nodes: number[],
	elements: ElementData[]
): ElasticResult['maxDeflection'] {
	const spans = elements.map((el, e) => {
		const ext = findAbsoluteExtreme(
			(s) => readElement(el, s, 'right').w,
			(s) => readElement(el, s, 'right').slope,
			el.L
		);
		return { x: nodes[e] + ext.s, value: assertFinite(ext.value, 'deflection') };
	});
	const overall = spans.reduce((a, b) => (Math.abs(b.value) > Math.abs(a.value) ? b : a));
	return { spans, overall };
}
