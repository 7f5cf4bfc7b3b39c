/**
 * Lateral-torsional buckling of every laterally unrestrained segment (EN 1993-1-1 6.3.2):
 * Mcr from the segment's own moment diagram and load height (general energy method), χLT by
 * the basis, Mb,Rd, and the worst load arrangement. Segments reaching a free cantilever tip are
 * outside scope (the fork-end model does not hold there).
 */
import type { Load } from '../model/types';
import type { CheckContext } from './context';
import { prepareCriticalMoment } from './mcr';
import { spanOf } from './plastic-bending';
import { computeLoadHeight, type LoadHeight, type RestraintSegment } from './restraint';
import type { SegmentLoad } from './segment-moment';
import type { CheckResult } from './types';
import { findWorstArrangement } from './worst-arrangement';

/** Options of {@link checkBeamLtb}. */
export interface LtbCheckOptions {
	segments: RestraintSegment[];
	/** Where the loads act over the depth. */
	loadHeight: LoadHeight;
	/** Use Wel (Class 3) instead of Wpl for Wy. */
	elasticModulus: boolean;
}

/** LTB rows, and the reasons a segment is outside scope. */
export function checkBeamLtb(
	ctx: CheckContext,
	o: LtbCheckOptions
): { checks: CheckResult[]; outOfScope: string[] } {
	const checks: CheckResult[] = [];
	const outOfScope: string[] = [];
	o.segments.forEach((seg, index) => {
		const m = ctx.members[spanOf(ctx.nodes, (seg.from + seg.to) / 2)];
		if (seg.freeEnd) {
			outOfScope.push(
				'A cantilever tip is not restrained laterally: its buckling is outside this tool ' +
					'(add a restraint at the tip).'
			);
			return;
		}
		if (!m.propsKnown) return;
		const Wy = o.elasticModulus ? m.Wel : m.Wpl;
		const zg = computeLoadHeight(o.loadHeight, m.h);
		// One part per load group: any arrangement and multiplier is a weighted sum of them.
		const groups = ctx.effects.groups;
		const prepared = prepareCriticalMoment({
			parts: groups.map((g) => ({
				length: seg.to - seg.from,
				momentStart: g.at(seg.from, 'right').M,
				momentEnd: g.at(seg.to, 'left').M,
				loads: clipLoads(g.loads, seg, 1)
			})),
			EIz: ctx.basis.E * m.Iz,
			GIt: ctx.basis.G * m.It,
			EIw: ctx.basis.E * m.Iw,
			zg
		});
		// The row depends only on the weights: arrangements and trial multipliers repeat them.
		const seen = new Map<string, ReturnType<typeof evaluate>>();
		// Each group's moment at the quarter points, for bases that read them (AISC Cb, F1-1).
		const quarters = [0.25, 0.5, 0.75].map((f) =>
			groups.map((g) => g.at(seg.from + f * (seg.to - seg.from), 'right').M)
		);
		const evaluate = (weights: number[]) => {
			const cr = prepared.at(weights);
			// No moment, or one at round-off level (a load a hair from a support): no buckling.
			if (cr === null || !Number.isFinite(cr.mcr)) return { utilisation: 0, detail: null };
			const r = ctx.basis.computeLtbResistance({
				...m,
				Wy,
				mcr: cr.mcr,
				length: seg.to - seg.from,
				moments: readQuarterMoments(quarters, weights, cr.mMax),
				resistance: ctx.resistance
			});
			return { utilisation: cr.mMax / r.mbRd, detail: { ...r, mcr: cr.mcr, mEd: cr.mMax } };
		};
		const worst = findWorstArrangement(ctx.arrangements, (arr, t) => {
			const weights = groups.map((g) => g.weight(arr) * (g.kind === 'temporary' ? t : 1));
			const key = weights.join(' ');
			let e = seen.get(key);
			if (!e) seen.set(key, (e = evaluate(weights)));
			return e;
		});
		const d = worst.detail;
		checks.push({
			id: 'ltb',
			label: `Lateral-torsional buckling, segment ${index + 1}`,
			clause: d?.clause ?? ctx.basis.words.clauses.ltb,
			level: 'governing',
			utilisation: worst.utilisation,
			utilisationExisting: worst.utilisationExisting,
			pass: worst.utilisation <= 1,
			multiplierAtCapacity: worst.multiplier,
			values: d
				? {
						mEd: d.mEd,
						mcr: d.mcr,
						...d.values,
						mbRd: d.mbRd,
						from: seg.from,
						to: seg.to
					}
				: { from: seg.from, to: seg.to },
			x: seg.from,
			arrangement: worst.arrangement.name,
			note: d ? d.note : 'No moment in this segment.'
		});
	});
	return { checks, outOfScope };
}

/** |M| at a segment's quarter points for the group weights, with its largest |M|, N·mm. */
function readQuarterMoments(quarters: number[][], weights: number[], max: number) {
	const at = (k: number) => Math.abs(quarters[k].reduce((s, m, i) => s + m * weights[i], 0));
	return { max, quarter: at(0), centre: at(1), threeQuarter: at(2) };
}

/** Loads inside a segment, in its own coordinate, scaled by a factor. */
function clipLoads(loads: Load[], seg: RestraintSegment, factor: number): SegmentLoad[] {
	const out: SegmentLoad[] = [];
	if (factor === 0) return out;
	for (const l of loads) {
		if (l.kind === 'point') {
			if (l.x > seg.from && l.x < seg.to) {
				out.push({ kind: 'point', x: l.x - seg.from, value: l.value * factor });
			}
			continue;
		}
		const a = Math.max(l.from, seg.from);
		const b = Math.min(l.to, seg.to);
		if (b <= a) continue;
		const at = (x: number) =>
			l.kind === 'uniform'
				? l.value * factor
				: (l.start + ((l.end - l.start) * (x - l.from)) / (l.to - l.from)) * factor;
		out.push({ kind: 'line', from: a - seg.from, to: b - seg.from, start: at(a), end: at(b) });
	}
	return out;
}
