/**
 * The capacity curve: the largest single downward point load P_max(x) at every position x along
 * the beam line, with the fixed loads on (a hoist on a trolley, a load that may be set down
 * anywhere). Every value is an exact collapse solve; the minimum is found by Brent's method on
 * the exact function between samples, not read off the samples.
 */
import type { BeamLine, CapacitySegment, Load } from '../model/types';
import { assertFinite } from '../model/issue';
import { minimiseOnInterval } from './minimise';
import { normaliseProblem } from './normalise';
import {
	assertValidProblem,
	findFixedLoadField,
	reportFixedLoadFailure,
	solveLoadFactorOnly,
	solveNormalised,
	type FixedLoadField
} from './solve';
import { computeNodePositions } from './statics';
import type { CapacityCurve, CapacityPoint, CollapseProblem } from './types';

/** Samples per beam length between critical positions (at least MIN_PER_INTERVAL each). */
const SAMPLES_PER_BEAM = 48;
const MIN_PER_INTERVAL = 3;

type CurveOptions = { beam: BeamLine; capacity: CapacitySegment[]; fixedLoads: Load[] };

function normaliseAt(options: CurveOptions, x: number) {
	const problem: CollapseProblem = {
		...options,
		variableLoads: [{ kind: 'point', x, value: 1, action: 'temporary' }]
	};
	return normaliseProblem(problem);
}

/** P_max at x, N (a 1 N load times λ); null where the load goes straight into a support. */
function evaluatePmax(options: CurveOptions, x: number): number | null {
	const { problem, scale } = normaliseAt(options, x);
	const P = solveLoadFactorOnly(problem, scale);
	return P === null ? null : assertFinite(P, 'Pmax');
}

/** The full certified solve at x, for the minimum. */
function solveAt(options: CurveOptions, fixedField: FixedLoadField, x: number) {
	const { problem, scale } = normaliseAt(options, x);
	return solveNormalised(problem, scale, fixedField);
}

/** Positions where P_max may have a kink: nodes, fixed-load points and ends, section changes. */
function findCriticalPositions(options: {
	beam: BeamLine;
	capacity: CapacitySegment[];
	fixedLoads: Load[];
}): number[] {
	const xs = computeNodePositions(options.beam);
	const L = xs[xs.length - 1];
	for (const l of options.fixedLoads) {
		if (l.kind === 'point') xs.push(l.x);
		else xs.push(l.from, l.to);
	}
	for (const c of options.capacity) xs.push(c.from, c.to);
	const sorted = xs.filter((x) => x >= 0 && x <= L).sort((a, b) => a - b);
	return sorted.filter((x, i) => i === 0 || x - sorted[i - 1] > 1e-9 * L);
}

/**
 * P_max(x), N, for one downward point load at any position, with the fixed loads on.
 * @example computeCapacityCurve({ beam: { spans: [6000], supports: ['pin', 'pin'], joints: [] },
 *   capacity: [{ from: 0, to: 6000, sagging: 100e6, hogging: 100e6 }], fixedLoads: [] }).minimum
 * // → { x: 3000, Pmax: 66 667 N (4Mp/L) , … }
 */
export function computeCapacityCurve(options: {
	beam: BeamLine;
	capacity: CapacitySegment[];
	fixedLoads: Load[];
}): CapacityCurve {
	assertValidProblem({ ...options, variableLoads: [] });
	const L = computeNodePositions(options.beam).at(-1) as number;
	const probe = normaliseProblem({
		...options,
		variableLoads: [{ kind: 'point', x: 0, value: 1, action: 'temporary' }]
	});
	const fixedField = findFixedLoadField(probe.problem);
	if (fixedField.slack < -1e-12)
		return {
			status: 'fails-under-fixed',
			message: reportFixedLoadFailure(fixedField.slack).message
		};
	const evaluate = (x: number) => evaluatePmax(options, x);
	const critical = findCriticalPositions(options);
	const xs: number[] = [];
	critical.forEach((x, i) => {
		xs.push(x);
		const next = critical[i + 1];
		if (next === undefined) return;
		const k = Math.max(MIN_PER_INTERVAL, Math.ceil((SAMPLES_PER_BEAM * (next - x)) / L));
		for (let j = 1; j <= k; j++) xs.push(x + ((next - x) * j) / (k + 1));
	});
	const values = xs.map(evaluate);
	const best = refineMinimum(xs, values, (x) => evaluate(x) ?? Infinity, L);
	if (!best)
		return {
			status: 'unbounded',
			message: 'A point load anywhere on this beam goes straight into a support.'
		};
	const final = solveAt(options, fixedField, best.x);
	if (final.status !== 'mechanism' && final.status !== 'not-certified')
		throw new Error('invariant: minimum of the capacity curve is not a mechanism');
	const points: CapacityPoint[] = xs.map((x, i) => ({ x, Pmax: values[i] }));
	if (!xs.includes(best.x)) points.push({ x: best.x, Pmax: final.loadFactor });
	points.sort((a, b) => a.x - b.x);
	return {
		status: 'ok',
		points,
		minimum: {
			x: assertFinite(best.x, 'x of minimum'),
			Pmax: final.loadFactor,
			mechanism: final.mechanism.name
		},
		certified: final.certified
	};
}

/** Refines every sampled local minimum within 10 % of the lowest sample; returns the lowest. */
function refineMinimum(
	xs: number[],
	values: (number | null)[],
	f: (x: number) => number,
	L: number
): { x: number; P: number } | null {
	const v = values.map((p) => p ?? Infinity);
	const lowest = Math.min(...v);
	if (!Number.isFinite(lowest)) return null;
	let best = { x: xs[v.indexOf(lowest)], P: lowest };
	for (let i = 0; i < xs.length; i++) {
		const left = i > 0 ? v[i - 1] : Infinity;
		const right = i + 1 < xs.length ? v[i + 1] : Infinity;
		if (!(v[i] <= left && v[i] <= right) || v[i] > 1.1 * lowest) continue;
		const a = xs[Math.max(0, i - 1)];
		const b = xs[Math.min(xs.length - 1, i + 1)];
		const m = minimiseOnInterval(f, a, b, 1e-10 * L);
		if (m.f < best.P) best = { x: m.x, P: m.f };
	}
	return best;
}
