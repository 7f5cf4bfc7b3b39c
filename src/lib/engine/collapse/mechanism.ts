/**
 * The mechanism read from the dual of the static program: a positive dual value on a sagging
 * (hogging) row is a sagging (hogging) hinge at that point, its size the hinge rotation. Also
 * gives the mechanism a plain-language name from the spans that move.
 */
import type { BeamLine } from '../model/types';
import type { CheckPoint } from './lower-bound';
import type { HingeCandidate } from './hinge-set';
import type { MechanismSummary } from './types';
import { computeNodePositions } from './statics';
import { evaluateDisplacement, type Displacement, type Kink } from './virtual-work';

/** Hinge rotations from the dual values; rows were divided by Mp, so θ = w / Mp. */
export function readHinges(points: CheckPoint[], duals: [number, number][]): HingeCandidate[] {
	const largest = Math.max(0, ...duals.flat());
	const hinges: HingeCandidate[] = [];
	points.forEach((p, i) => {
		const [sag, hog] = duals[i];
		const theta = sag / p.sag - hog / p.hog;
		// Dual values below rounding level of the largest are not hinges.
		if (Math.max(sag, hog) <= 1e-10 * largest || theta === 0) return;
		hinges.push({ x: p.x, side: p.side, rotation: theta, sag: p.sag, hog: p.hog });
	});
	return hinges.sort((a, b) => a.x - b.x || a.side - b.side);
}

/** Letter of a node: A, B, C … (then A1 … for very long lines). */
export function nameNode(node: number): string {
	return node < 26 ? String.fromCharCode(65 + node) : `N${node + 1}`;
}

/** Spans whose deflection is not zero in the mechanism (0-based). */
export function findMovingSpans(beam: BeamLine, d: Displacement): number[] {
	const X = computeNodePositions(beam);
	const scale = Math.max(...d.kinks.map((k) => Math.abs(k.rotation)), 1e-300) * X[X.length - 1];
	const moving: number[] = [];
	for (let s = 0; s < beam.spans.length; s++) {
		const xs = [
			X[s],
			X[s + 1],
			...d.kinks.filter((k) => k.x > X[s] && k.x < X[s + 1]).map((k) => k.x)
		];
		if (xs.some((x) => Math.abs(evaluateDisplacement(d, x)) > 1e-9 * scale)) moving.push(s);
	}
	return moving;
}

/** Plain-language name of the mechanism. */
export function nameMechanism(beam: BeamLine, hinges: Kink[], spans: number[]): MechanismSummary {
	const n = beam.spans.length;
	const X = computeNodePositions(beam);
	const label = (s: number) => `${s + 1}`;
	if (spans.length === 1) {
		const s = spans[0];
		const freeLeft = s === 0 && beam.supports[0] === 'free';
		const freeRight = s === n - 1 && beam.supports[n] === 'free';
		const rootNode = freeLeft ? 1 : freeRight ? n - 1 : -1;
		const atRoot = rootNode >= 0 && hinges.every((h) => Math.abs(h.x - X[rootNode]) <= 1e-9 * X[n]);
		if (atRoot && n === 1) return { name: 'cantilever root', spans };
		if (atRoot) return { name: `overhang root at support ${nameNode(rootNode)}`, spans };
		if (freeLeft || freeRight)
			return {
				name: n === 1 ? 'cantilever mechanism' : `overhang mechanism in span ${label(s)}`,
				spans
			};
		return { name: `beam mechanism in span ${label(s)}`, spans };
	}
	const first = spans[0];
	const last = spans[spans.length - 1];
	const contiguous = last - first + 1 === spans.length;
	const range = contiguous ? `${label(first)}–${label(last)}` : spans.map(label).join(', ');
	return { name: `combined mechanism over spans ${range}`, spans };
}
