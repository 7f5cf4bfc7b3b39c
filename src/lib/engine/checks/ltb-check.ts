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
import type { LtbSegment, SegmentLoad } from './segment-moment';
import type { CheckResult } from './types';
import type { LoadGroup } from './load-effects';
import type { LoadArrangement } from './load-arrangements';
import { arrangementSelection } from './linear-arrangements';
import { prepareBucklingBound, type BucklingBound, type SolvedWeighting } from './ltb-bound';
import type { PreparedCriticalMoment } from './mcr';
import { findWorstArrangement, findWorstArrangementBounded } from './worst-arrangement';

/** Solved weightings of other classes a bound tries when its own class has none. */
const OTHER_CLASS_REFS = 4;

/** Below this many arrangements every one is evaluated (the bound costs about 20 solves). */
const BOUND_FROM = 24;

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
	const groups = ctx.effects.groups;
	const weighting = listWeightings(ctx.arrangements, groups);
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
		const parts = groups.map((g) => ({
			length: seg.to - seg.from,
			momentStart: g.at(seg.from, 'right').M,
			momentEnd: g.at(seg.to, 'left').M,
			loads: clipLoads(g.loads, seg, 1)
		}));
		const prepared = prepareCriticalMoment({
			parts,
			EIz: ctx.basis.E * m.Iz,
			GIt: ctx.basis.G * m.It,
			EIw: ctx.basis.E * m.Iw,
			zg,
			memo: ctx.bucklingMemo
		});
		// Each group's moment at the quarter points, for bases that read them (AISC Cb, F1-1).
		const quarters = [0.25, 0.5, 0.75].map((f) =>
			groups.map((g) => g.at(seg.from + f * (seg.to - seg.from), 'right').M)
		);
		// One input per segment, updated in place: the resistance is asked for thousands of times
		// (every bound) and the basis only reads its input.
		const probe = {
			...m,
			Wy,
			mcr: 0,
			length: seg.to - seg.from,
			moments: readQuarterMoments(quarters, [], 0),
			resistance: ctx.resistance
		};
		const resist = (weights: number[], mcr: number, mMax: number) => {
			probe.mcr = mcr;
			probe.moments = readQuarterMoments(quarters, weights, mMax);
			return ctx.basis.computeLtbResistance(probe);
		};
		const evaluate = (weights: number[]) => {
			const { mMax, mu } = prepared.solve(weights);
			if (solved && mMax > 0 && !Number.isNaN(mu)) solved.add(weights, mu);
			// No moment, or one at round-off level (a load a hair from a support): no buckling.
			if (!(mMax > 0) || !(mu > 0)) return { utilisation: 0, detail: null };
			const mcr = (1 / mu) * mMax;
			if (!Number.isFinite(mcr)) return { utilisation: 0, detail: null };
			const r = resist(weights, mcr, mMax);
			const detail = {
				mbRd: r.mbRd,
				clause: r.clause,
				note: r.note,
				values: r.values,
				mcr,
				mEd: mMax
			};
			return { utilisation: mMax / r.mbRd, detail };
		};
		// The row depends only on the weights: arrangements and trial multipliers repeat them.
		const seen = new Map<number, Map<number, ReturnType<typeof evaluate>>>();
		const cached = (arr: LoadArrangement, t: number) => {
			const w = weighting.get(arr)!;
			let byT = seen.get(w.id);
			if (!byT) seen.set(w.id, (byT = new Map()));
			let e = byT.get(t);
			if (!e) byT.set(t, (e = evaluate(weightsAt(w, t))));
			return e;
		};
		const bounded = !arrangementSelection.exhaustive && ctx.arrangements.length >= BOUND_FROM;
		const solved = bounded ? new SolvedWeightings(parts, prepared) : null;
		// Per weighting and multiplier: its largest |M|, and the last bound with the μ it came from
		// (a bound made again often finds the same μ: no new resistance is then needed).
		const known = new Map<number, Map<number, { mMax: number; mu: number; u: number }>>();
		const bound = (arr: LoadArrangement, t: number) => {
			// A bound on μ gives one on the utilisation: the buckling resistance does not fall as
			// Mcr rises (all else equal), so a lower bound on Mcr bounds MEd/Mb,Rd from above.
			const w = weighting.get(arr)!;
			const weights = weightsAt(w, t);
			const mu = solved!.bound(weights);
			if (!(mu < Infinity)) return Infinity;
			let byT = known.get(w.id);
			if (!byT) known.set(w.id, (byT = new Map()));
			let k = byT.get(t);
			if (!k) byT.set(t, (k = { mMax: prepared.peak(weights), mu: NaN, u: Infinity }));
			if (k.mu === mu) return k.u;
			const { mMax } = k;
			let u = 0;
			if (mMax > 0 && mu > 0 && Number.isFinite(mMax / mu)) {
				const v = mMax / resist(weights, mMax / mu, mMax).mbRd;
				u = Number.isNaN(v) ? Infinity : v * (1 + 1e-9);
			}
			k.mu = mu;
			k.u = u;
			return u;
		};
		const worst = bounded
			? findWorstArrangementBounded(ctx.arrangements, cached, bound)
			: findWorstArrangement(ctx.arrangements, cached);
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
	const at = (k: number) => {
		let s = 0;
		for (let i = 0; i < weights.length; i++) s += quarters[k][i] * weights[i];
		return Math.abs(s);
	};
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

/** An arrangement's weights on the load groups, with the temporary group's place. */
interface Weighting {
	/** Same id for the same weights. */
	id: number;
	weights: number[];
	temporary: number;
}

/** Weights per arrangement, shared by every segment (the groups are the beam's). */
function listWeightings(arrangements: LoadArrangement[], groups: LoadGroup[]) {
	const ids = new Map<string, number>();
	const temporary = groups.findIndex((g) => g.kind === 'temporary');
	return new Map(
		arrangements.map((arr) => {
			const weights = groups.map((g) => g.weight(arr));
			const key = weights.join(' ');
			if (!ids.has(key)) ids.set(key, ids.size);
			return [arr, { id: ids.get(key)!, weights, temporary }];
		})
	);
}

/** Weights at multiplier t: the temporary group's weight times t. */
function weightsAt(w: Weighting, t: number): number[] {
	if (w.temporary < 0) return w.weights;
	const out = [...w.weights];
	out[w.temporary] = w.weights[w.temporary] * t;
	return out;
}

/**
 * Weightings of one segment already solved, by the weights of the groups with loads inside the
 * segment (those of one class differ only in their end moments: the bound is closest there).
 */
class SolvedWeightings {
	private bb: BucklingBound | null = null;
	private byClass = new Map<string, SolvedWeighting[]>();
	private all: SolvedWeighting[] = [];
	private inside: number[];
	constructor(
		private parts: LtbSegment[],
		private prepared: PreparedCriticalMoment
	) {
		this.inside = parts.flatMap((p, i) => (p.loads.length > 0 ? [i] : []));
	}
	private classOf(weights: number[]): string {
		return this.inside.map((i) => weights[i]).join(' ');
	}
	add(weights: number[], mu: number): void {
		this.bb ??= prepareBucklingBound(this.prepared, this.parts);
		const { A, B } = this.bb.endMoments(weights);
		const s = { weights, A, B, mu, norm: this.bb.norm(weights) };
		const key = this.classOf(weights);
		const list = this.byClass.get(key);
		if (list) list.push(s);
		else this.byClass.set(key, [s]);
		this.all.push(s);
	}
	/** Upper bound on μ of a weighting (Infinity before any solve). */
	bound(weights: number[]): number {
		if (!this.bb) return Infinity;
		const { A, B } = this.bb.endMoments(weights);
		const norm = this.bb.norm(weights);
		const same = this.byClass.get(this.classOf(weights));
		// Otherwise the latest few solved (each bound from another class costs a loop).
		const refs = same ?? this.all.slice(-OTHER_CLASS_REFS);
		let best = Infinity;
		for (const r of refs) best = Math.min(best, this.bb.fromSolved(weights, A, B, norm, r, !!same));
		return best;
	}
}
