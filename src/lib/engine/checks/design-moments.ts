/**
 * The elastic design moments the elastic route rests on, for drawing: the moment diagram of the
 * arrangement that governs, under the design loads as entered (multiplier 1), and the resistance
 * each stretch of beam is checked against (the section's, or the buckling resistance of a segment
 * where that is lower, named in the basis's notation: Mb,Rd, φbMn …).
 */
import type { CheckContext } from './context';
import type { CheckResult } from './types';

/** Samples per span; point loads add both sides of their jump in shear (the moment is a kink). */
const SAMPLES_PER_SPAN = 40;

/** Design moments and the limits they are checked against, internal units (mm, N·mm). */
export interface DesignMoments {
	arrangement: string;
	x: number[];
	M: number[];
	/** Resistance over a stretch of beam, with what it is. */
	limits: { from: number; to: number; value: number; label: string }[];
}

/**
 * The diagram for the arrangement named by `governing` (a check row), or the first one.
 * @param resistance section resistance per span, N·mm (Wpl·fy/γM0 or Wel·fy/γM0 by route)
 */
export function sampleDesignMoments(
	ctx: CheckContext,
	o: { governing: CheckResult | undefined; checks: CheckResult[]; resistance: number[] }
): DesignMoments {
	const arr =
		ctx.arrangements.find((a) => a.name === o.governing?.arrangement) ?? ctx.arrangements[0];
	const xs = new Set<number>();
	ctx.beam.spans.forEach((L, i) => {
		for (let k = 0; k <= SAMPLES_PER_SPAN; k++) xs.add(ctx.nodes[i] + (L * k) / SAMPLES_PER_SPAN);
	});
	for (const l of ctx.loads) if (l.kind === 'point') xs.add(l.x);
	const x = [...xs].sort((a, b) => a - b);
	const M = x.map((p) => ctx.effects.fixedAt(arr, p).M + ctx.effects.variableAt(arr, p).M);
	const limits = ctx.beam.spans.map((_, i) => ({
		from: ctx.nodes[i],
		to: ctx.nodes[i + 1],
		value: o.resistance[i],
		label: 'section resistance'
	}));
	for (const c of o.checks) {
		if (c.id !== 'ltb' || c.values.mbRd === undefined) continue;
		const label = ctx.basis.words.notation.mbRd ?? 'buckling resistance';
		limits.push({ from: c.values.from, to: c.values.to, value: c.values.mbRd, label });
	}
	return { arrangement: arr.name, x, M, limits };
}
