/**
 * Largest |M| in a segment under any weighted sum of its parts (one per load group), exactly.
 * Between breakpoints (the segment's ends, point loads, ends of line loads) each part's moment
 * is a cubic, since its line loads are linear; so is any weighted sum, and its largest |M| on a
 * piece lies at an end or where the shear is zero (a root of a quadratic).
 */
import { buildPieceGrid, fitCubic, quadraticRoot } from '../elastic/moment-pieces';
import { computeSegmentMoment, type LtbSegment } from './segment-moment';

/**
 * Fits every part once; the returned function costs four coefficients per part and piece.
 * @example
 * const peak = prepareSegmentPeak([{ length: 6000, momentStart: 0, momentEnd: 0,
 *   loads: [{ kind: 'line', from: 0, to: 6000, start: 1, end: 1 }] }]);
 * peak([2]) // 2 × 1 × 6000² / 8 = 9e6
 */
export function prepareSegmentPeak(parts: LtbSegment[]): (weights: ArrayLike<number>) => number {
	const edges = listBreaks(parts);
	const nParts = parts.length;
	const pieces = edges.length - 1;
	// Coefficients by piece, then part, then power: one pass over memory per weighting.
	const coef = new Float64Array(pieces * nParts * 4);
	const widths = new Float64Array(pieces);
	for (let k = 0; k < pieces; k++) {
		const a = edges[k];
		const h = edges[k + 1] - a;
		widths[k] = h;
		parts.forEach((part, i) => {
			const c = fitCubic((x) => computeSegmentMoment(part, x), a, h);
			coef.set(c, (k * nParts + i) * 4);
		});
	}
	return (weights) => {
		let best = 0;
		for (let k = 0, at = 0; k < pieces; k++) {
			let c0 = 0;
			let c1 = 0;
			let c2 = 0;
			let c3 = 0;
			for (let i = 0; i < nParts; i++, at += 4) {
				const w = weights[i];
				if (w === 0) continue;
				c0 += w * coef[at];
				c1 += w * coef[at + 1];
				c2 += w * coef[at + 2];
				c3 += w * coef[at + 3];
			}
			const h = widths[k];
			best = Math.max(best, Math.abs(c0), Math.abs(c0 + h * (c1 + h * (c2 + h * c3))));
			for (let r = 0; r < 2; r++) {
				const u = quadraticRoot(3 * c3, 2 * c2, c1, r);
				if (u > 0 && u < h) best = Math.max(best, Math.abs(c0 + u * (c1 + u * (c2 + u * c3))));
			}
		}
		return best;
	};
}

/**
 * Ends, point loads and ends of line loads of every part, sorted, breaks within round-off of
 * another merged: the elastic pieces' own grid, for a single span of the segment's length.
 */
function listBreaks(parts: LtbSegment[]): number[] {
	const L = parts[0]?.length ?? 0;
	const loads = parts.flatMap((p) =>
		p.loads.map((l) =>
			l.kind === 'point' ? { kind: l.kind, a: l.x } : { kind: l.kind, a: l.from, b: l.to }
		)
	);
	return buildPieceGrid([0, L], [loads]).breakpoints[0];
}
