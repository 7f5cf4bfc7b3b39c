/**
 * Is the lateral restraint enough for plastic hinges? Each hinge needs a restraint within h/2
 * (EN 1993-1-1 6.3.5.2, from memory; kept on every basis as the cautious reading of "braced at
 * the hinge"), and the segments next to it must be no longer than the basis's stable length
 * (EN 1993-1-1 6.3.5.3; AISC 360-22 Appendix 1 Lpd). A segment with loads inside is taken with
 * ψ = 1, the shortest stable length.
 */
import { momentAt, type Hinge, type CollapseDiagram } from '../collapse/index';
import { mmToM } from '../units';
import type { DesignBasis } from './design-basis';
import { computeEndMomentRatio } from './end-moment-ratio';
import type { SpanMember } from './member';
import { spanOf } from './plastic-bending';
import type { RestraintSegment } from './restraint';

/** Inputs of {@link checkHingeRestraint}. */
export interface HingeRestraintInput {
	basis: DesignBasis<unknown>;
	hinges: Hinge[];
	diagram: CollapseDiagram;
	/** Segments between restraints; empty means restrained throughout. */
	segments: RestraintSegment[];
	nodes: number[];
	members: SpanMember[];
	/** Positions of point loads and load edges, mm (to tell whether a segment is loaded). */
	loadPositions: { from: number; to: number }[];
}

/** Whether the hinges are restrained, and the reason when not. */
export function checkHingeRestraint(o: HingeRestraintInput): { ok: boolean; reason?: string } {
	if (o.segments.length === 0) return { ok: true };
	for (const hinge of o.hinges) {
		const m = o.members[spanOf(o.nodes, hinge.x)];
		const near = o.segments.filter(
			(s) => Math.abs(s.from - hinge.x) <= m.h / 2 || Math.abs(s.to - hinge.x) <= m.h / 2
		);
		if (near.length === 0) {
			const at = mmToM(hinge.x).toFixed(2);
			return { ok: false, reason: `no lateral restraint within h/2 of the hinge at ${at} m` };
		}
		for (const s of near) {
			const loaded = o.loadPositions.some((l) => l.to > s.from && l.from < s.to);
			const psi = loaded
				? 1
				: computeEndMomentRatio(
						momentAt(o.diagram, s.from, 'right'),
						momentAt(o.diagram, s.to, 'left')
					);
			const { shape, fy, iz, h, tf } = m;
			const stable = o.basis.computeStableLength({ shape, fy, iz, h, tf, psi });
			if (stable === null || s.to - s.from > stable) {
				const [a, b] = [mmToM(s.from).toFixed(2), mmToM(s.to).toFixed(2)];
				const limit = o.basis.words.stableLength;
				const reason = `the segment from ${a} to ${b} m next to a hinge exceeds ${limit}`;
				return { ok: false, reason };
			}
		}
	}
	return { ok: true };
}
