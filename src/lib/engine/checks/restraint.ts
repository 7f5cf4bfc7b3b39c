/**
 * Lateral restraint of the compression flange and the segments it cuts the beam into. Supports
 * always restrain; free ends of overhangs do not, unless a restraint is placed there.
 */
import type { SupportKind } from '../model/types';

/** Where the compression flange is held laterally. */
export type LateralRestraint =
	| { kind: 'continuous' }
	| { kind: 'ends-only' }
	/** Restraint positions from the left end of the beam, mm. */
	| { kind: 'points'; at: number[] };

/** Where a load acts relative to the shear centre (destabilising above it). */
export type LoadHeight = 'top-flange' | 'shear-centre' | 'bottom-flange';

/** A stretch of beam between two lateral restraints, mm from the left end. */
export interface RestraintSegment {
	from: number;
	to: number;
	/** True when one end is a free (unrestrained) cantilever tip. */
	freeEnd: boolean;
}

/**
 * Height zg of the load point above the shear centre, mm, for a doubly symmetric section of
 * depth h: +h/2 on the top flange, −h/2 on the bottom flange (NCCI SN003 convention, from memory).
 */
export function computeLoadHeight(height: LoadHeight, h: number): number {
	return height === 'top-flange' ? h / 2 : height === 'bottom-flange' ? -h / 2 : 0;
}

/**
 * Cuts the beam into segments between lateral restraints; none for continuous restraint.
 * @param o.spans span lengths, mm; o.supports one per node
 * @example
 * listRestraintSegments({ spans: [6000], supports: ['pin', 'pin'],
 *   restraint: { kind: 'points', at: [3000] } }) // [0–3000, 3000–6000]
 */
export function listRestraintSegments(o: {
	spans: number[];
	supports: SupportKind[];
	restraint: LateralRestraint;
}): RestraintSegment[] {
	if (o.restraint.kind === 'continuous') return [];
	const nodes = [0];
	for (const s of o.spans) nodes.push(nodes[nodes.length - 1] + s);
	const total = nodes[nodes.length - 1];
	const held = new Set<number>();
	nodes.forEach((x, i) => {
		if (o.supports[i] !== 'free') held.add(x);
	});
	if (o.restraint.kind === 'points') {
		for (const x of o.restraint.at) if (x >= 0 && x <= total) held.add(x);
	}
	const cuts = [...new Set([0, total, ...held])].sort((a, b) => a - b);
	const out: RestraintSegment[] = [];
	for (let i = 1; i < cuts.length; i++) {
		const from = cuts[i - 1];
		const to = cuts[i];
		if (to - from <= 0) continue;
		out.push({ from, to, freeEnd: !held.has(from) || !held.has(to) });
	}
	return out;
}
