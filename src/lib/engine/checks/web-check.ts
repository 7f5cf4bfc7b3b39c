/**
 * Local web resistance where a point load or a support reaction bears on an unstiffened I web,
 * one row per bearing point, worst load arrangement; the basis gives the resistance from where
 * the force stands (Eurocode: EN 1993-1-5 6.2–6.6 with the load type of its Figure 6.1, see
 * `en1993/web.ts`; AISC: J10.2–J10.5). Where the basis asks for it and the loaded flange is in
 * compression, the row also covers bending at the same section, η2 + 0.8·η1 ≤ 1.4
 * (EN 1993-1-5 7.2(1)). Hollow and solid sections are not checked (said in the notices).
 */
import { momentAt } from '../collapse/index';
import type { WebPlace } from './basis-types';
import { sumArrangementLoads, shiftCollapseValue, type CheckContext } from './context';
import type { LoadArrangement } from './load-arrangements';
import type { RestraintSegment } from './restraint';
import type { CheckResult } from './types';
import { selectLinearArrangements } from './linear-arrangements';
import { listWebForces, type LoadedFlange, type WebForce } from './web-forces';
import { findWorstArrangement } from './worst-arrangement';

/** Stiff bearing lengths, mm. */
export interface BearingLengths {
	/** One per support node. */
	supports: number[];
	/** Under point loads. */
	loads: number;
}

/**
 * One row per support and per point-load position on an I-section web.
 * @param segments lateral restraint segments (empty: the compression flange held throughout)
 */
export function checkBeamWebs(
	ctx: CheckContext,
	bearing: BearingLengths,
	segments: RestraintSegment[] = []
): CheckResult[] {
	const out: CheckResult[] = [];
	// Each group's point loads summed by position once (for picking arrangements by sign).
	const pointSums = ctx.effects.groups.map((g) => {
		const m = new Map<number, number>();
		for (const l of g.loads) if (l.kind === 'point') m.set(l.x, (m.get(l.x) ?? 0) + l.value);
		return m;
	});
	for (const f of listWebForces(ctx, bearing)) {
		const row = checkWebForce(ctx, f, pointSums, segments);
		if (row) out.push(row);
	}
	return out;
}

function checkWebForce(
	ctx: CheckContext,
	p: WebForce,
	pointSums: Map<number, number>[],
	segments: RestraintSegment[]
): CheckResult | null {
	const m = ctx.members[p.span];
	if (!m.propsKnown || (m.shape !== 'I' && m.shape !== 'welded-I')) return null;
	const web = ctx.basis.computeWebResistance({
		h: m.h,
		hw: m.hw,
		tw: m.tw,
		bf: m.b,
		tf: m.tf,
		r: m.r,
		Wel: m.Wel,
		fyw: m.fy,
		fyf: m.fy,
		E: ctx.basis.E,
		ss: p.ss,
		throughWeb: p.throughWeb,
		endDistance: p.endDistance,
		resistance: ctx.resistance,
		unbracedLength: findUnbracedLength(ctx, p, segments),
		loadedFlangeCompressed: p.flange === 'top'
	});
	const interaction = web.bendingInteraction;
	const elastic = ctx.route === 'elastic-first-yield';
	const mRd = interaction
		? ctx.basis.computeBendingResistance({ ...m, resistance: ctx.resistance, elastic })
		: 0;
	// A strength that depends on the moment at the force is not linear in the weights: every
	// arrangement is evaluated then.
	const picked = web.highMoment
		? ctx.arrangements
		: selectArrangements(ctx, { p, fRd: web.fRd, mRd, pointSums });
	const readingAt = (mEd: number) =>
		web.highMoment && Math.abs(mEd) >= web.highMoment.fromMoment ? web.highMoment.reading : web;
	const worst = findWorstArrangement(picked, (arr, t) => {
		const fEd = p.force(arr, t);
		const mEd = readMoment(ctx, arr, p.x, t);
		const eta2 = fEd / readingAt(mEd).fRd;
		const eta1 = mRd > 0 ? compressedFlangeMoment(mEd, p.flange) / mRd : 0;
		const combined = (eta2 + 0.8 * eta1) / 1.4;
		const detail = { fEd, mEd, eta1, eta2, combined, reading: readingAt(mEd) };
		return { utilisation: Math.max(eta2, combined), detail };
	});
	const d = worst.detail;
	const reading = d.reading;
	const where = describePlace(reading.place, p);
	const withBending = interaction !== null && d.combined > d.eta2;
	const bendingValues: Record<string, number> = interaction
		? { mEd: d.mEd, mRd, eta1: d.eta1, eta2: d.eta2 }
		: {};
	return {
		id: 'web',
		label: `Web ${p.flange === 'top' ? 'under' : 'at'} ${p.name} (${reading.kind}${where})`,
		clause: withBending ? interaction.clause : reading.clause,
		level: 'governing',
		utilisation: worst.utilisation,
		utilisationExisting: worst.utilisationExisting,
		pass: worst.utilisation <= 1,
		multiplierAtCapacity: worst.multiplier,
		values: { fEd: d.fEd, fRd: reading.fRd, ...reading.values, ...bendingValues },
		x: p.x,
		arrangement: worst.arrangement.name,
		note: reading.note + (withBending ? interaction.note : '')
	};
}

/**
 * Longest unbraced length of either flange at a force, mm: 0 over a support (both flanges held
 * there); elsewhere the span, since the model holds the other flange only at the supports.
 */
function findUnbracedLength(ctx: CheckContext, p: WebForce, segments: RestraintSegment[]): number {
	if (ctx.nodes.some((x, i) => x === p.x && ctx.beam.supports[i] !== 'free')) return 0;
	const span = ctx.beam.spans[p.span];
	const inSegment = segments.find((s) => p.x > s.from && p.x < s.to);
	return Math.max(span, inSegment ? inSegment.to - inSegment.from : 0);
}

/**
 * On the elastic routes the row is the largest of readings linear in the group weights: ±F/FRd
 * and (±F/FRd + 0.8·M/MRd)/1.4 for each sign of M the flange rule lets count (or none), so the
 * signs pick the arrangements worth evaluating. The collapse field of the plastic route is not
 * linear in them.
 */
function selectArrangements(
	ctx: CheckContext,
	o: { p: WebForce; fRd: number; mRd: number; pointSums: Map<number, number>[] }
): LoadArrangement[] {
	const { p, fRd, mRd } = o;
	if (ctx.plastic.size > 0) return ctx.arrangements;
	const groups = ctx.effects.groups;
	const forces: number[][] = [];
	if (p.sources.node !== null) {
		const node = p.sources.node;
		forces.push(groups.map((g) => g.result.reactions[node].force));
	}
	if (p.sources.loadAt !== null) {
		const x = p.sources.loadAt;
		forces.push(groups.map((_, i) => o.pointSums[i].get(x) ?? 0));
	}
	const moment = groups.map((g) => g.at(p.x, 'right').M);
	const moments: number[][] = [groups.map(() => 0)];
	if (mRd > 0 && p.flange !== 'bottom') moments.push(moment.map((m) => m / mRd));
	if (mRd > 0 && p.flange !== 'top') moments.push(moment.map((m) => -m / mRd));
	const readings = forces.flatMap((f) =>
		[1, -1].flatMap((sign) => {
			const eta2 = f.map((v) => (sign * v) / fRd);
			return [eta2, ...moments.map((m) => eta2.map((v, i) => (v + 0.8 * m[i]) / 1.4))];
		})
	);
	return selectLinearArrangements(ctx.arrangements, groups, readings);
}

/** Where the force stands, for the label. */
function describePlace(place: WebPlace, p: WebForce): string {
	if (place === 'through') return ', load over the support';
	if (place === 'span') return '';
	return p.flange !== 'top' && p.endDistance === 0 ? ', end support' : `, near ${p.endWord}`;
}

/** Moment of the loaded flange's sign: compression in the top flange is sagging, N·mm. */
function compressedFlangeMoment(mEd: number, flange: LoadedFlange): number {
	if (flange === 'both') return Math.abs(mEd);
	return Math.max(0, flange === 'top' ? mEd : -mEd);
}

/**
 * Moment at x for multiplier t (sagging +): on the plastic route the collapse field moved to t,
 * the field the verdict relies on; otherwise the elastic moment.
 */
function readMoment(ctx: CheckContext, arr: LoadArrangement, x: number, t: number): number {
	const p = ctx.plastic.get(arr);
	if (p && 'diagram' in p.result && p.loadFactor !== null) {
		const free = {
			fixed: ctx.released.fixedAt(arr, x).M,
			variable: ctx.released.variableAt(arr, x).M
		};
		const collapse = momentAt(p.result.diagram, x);
		const totals = sumArrangementLoads(ctx.released, arr);
		return shiftCollapseValue({ collapse, free, totals, lambda: p.loadFactor, t });
	}
	return ctx.effects.fixedAt(arr, x).M + t * ctx.effects.variableAt(arr, x).M;
}
