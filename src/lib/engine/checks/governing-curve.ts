/**
 * The governing capacity curve: the largest single proposed point load at each position along
 * the beam, with the existing loads present, over every check that decides the verdict. Each
 * point is a full design run with the proposed loads replaced by one point load at x, so the
 * curve can never disagree with the answer for a point load at the same position: a case whose
 * only proposed load is a point load at x gets exactly the curve's value at x.
 */
import { minimiseOnInterval } from '../collapse/minimise';
import type { Load } from '../model/types';
import type { DesignCheckInput, DesignCheckOutcome } from './inputs';
import type { DesignRunOptions } from './run-checks';

/** Size of the trial point load, N, when no proposed point load gives one. */
const UNIT_TRIAL = 1000;
/** Evenly spaced positions per span (ends excluded), before refinement. */
const POINTS_PER_SPAN = 8;
/** Distance from a support at which the first and last positions of a span sit, share of span. */
const END_GAP = 0.01;

/** One position of the curve, internal units. */
export interface CurvePoint {
	/** mm from the left end. */
	x: number;
	/** Largest characteristic point load there, N; null where no deciding check limits it. */
	p: number | null;
	/** The check that limits it; null where none does. */
	governing: { id: string; label: string } | null;
	/** True where the beam with this load is outside the method's scope (no value given). */
	outsideScope: boolean;
}

/** The curve and its least value. */
export interface GoverningCurve {
	points: CurvePoint[];
	/** The least value along the beam and what governs there; null when nothing limits. */
	min: CurvePoint | null;
}

/**
 * Computes the curve.
 * @param run one design run (the same one the answer comes from)
 */
export function computeGoverningCurve(
	input: DesignCheckInput,
	run: (input: DesignCheckInput, options: DesignRunOptions) => DesignCheckOutcome
): GoverningCurve {
	// Every run is on the same beam with the same existing loads: their analyses are shared.
	const shared: DesignRunOptions = {
		memo: new Map(),
		bucklingMemo: new Map(),
		verdictOnly: true
	};
	// A proposed point load is moved in place (same size, same order), so that at its own position
	// the run is the answer's own run; without one, a unit trial load is added.
	const proposed = input.loads.find(
		(l) => l.kind === 'point' && l.action === 'temporary' && l.value > 0
	);
	const size = proposed?.kind === 'point' ? proposed.value : UNIT_TRIAL;
	const loadsAt = (x: number): Load[] => {
		const trial: Load = { kind: 'point', x, value: size, action: 'temporary' };
		const kept = input.loads.flatMap((l) =>
			l === proposed ? [trial] : l.action === 'temporary' ? [] : [l]
		);
		return proposed ? kept : [...kept, trial];
	};
	const evaluate = (x: number): CurvePoint => {
		const v = run({ ...input, loads: loadsAt(x) }, shared).verdict;
		if (v.verdict === 'outside-scope') return { x, p: null, governing: null, outsideScope: true };
		const m = v.allowableMultiplier;
		const governing =
			m === null || !v.governing ? null : { id: v.governing.id, label: v.governing.label };
		return { x, p: m === null ? null : m * size, governing, outsideScope: false };
	};
	const points = listPositions(input).map(evaluate);
	const min = refineMinimum(points, evaluate);
	if (min && !points.some((p) => p.x === min.x)) {
		points.push(min);
		points.sort((a, b) => a.x - b.x);
	}
	return { points, min };
}

/** Positions: evenly in every span, a free end itself, and every given point load's position. */
function listPositions(input: DesignCheckInput): number[] {
	const { spans, supports } = input.beam;
	const xs: number[] = [];
	let start = 0;
	spans.forEach((L, i) => {
		for (let k = 0; k <= POINTS_PER_SPAN; k++) {
			const t = END_GAP + ((1 - 2 * END_GAP) * k) / POINTS_PER_SPAN;
			xs.push(start + t * L);
		}
		if (i === 0 && supports[0] === 'free') xs.push(0);
		if (i === spans.length - 1 && supports[spans.length] === 'free') xs.push(start + L);
		start += L;
	});
	for (const l of input.loads) if (l.kind === 'point' && l.x >= 0 && l.x <= start) xs.push(l.x);
	return [...new Set(xs)].sort((a, b) => a - b);
}

/**
 * The least sampled value refined between its neighbours by Brent's method; the refined point
 * is kept only when it is lower (the curve may have kinks where the governing check changes).
 */
function refineMinimum(
	points: CurvePoint[],
	evaluate: (x: number) => CurvePoint
): CurvePoint | null {
	let best = -1;
	points.forEach((p, i) => {
		if (p.p !== null && (best < 0 || p.p < points[best].p!)) best = i;
	});
	if (best < 0) return null;
	const a = points[Math.max(0, best - 1)].x;
	const b = points[Math.min(points.length - 1, best + 1)].x;
	if (b - a <= 0) return points[best];
	let last: CurvePoint = points[best];
	const f = (x: number) => {
		const p = evaluate(x);
		if (p.p !== null && p.p < (last.p ?? Infinity)) last = p;
		return p.p ?? Number.MAX_VALUE;
	};
	minimiseOnInterval(f, a, b, (b - a) * 1e-2);
	return last;
}
