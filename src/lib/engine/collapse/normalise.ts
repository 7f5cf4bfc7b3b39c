/**
 * Scales a collapse problem to dimensionless numbers (total length 1, largest Mp 1, variable
 * loads of unit total size) so that the linear programs see entries of order one. λ is
 * multiplied back by `lambda` on the way out.
 */
import type { CapacitySegment, Load } from '../model/types';
import type { CollapseProblem } from './types';

/** Factors that turn normalised numbers back into N, mm, N·mm. */
export interface ProblemScale {
	/** Length, mm. */
	length: number;
	/** Moment, N·mm. */
	moment: number;
	/** Force = moment / length, N. */
	force: number;
	/** Multiplies a normalised λ into the true λ. */
	lambda: number;
}

/** Sum of the absolute resultants of the loads, N (a size, not an equilibrium quantity). */
export function measureLoadSize(loads: Load[]): number {
	let size = 0;
	for (const l of loads) {
		if (l.kind === 'point') size += Math.abs(l.value);
		else if (l.kind === 'uniform') size += Math.abs(l.value) * (l.to - l.from);
		else size += ((Math.abs(l.start) + Math.abs(l.end)) / 2) * (l.to - l.from);
	}
	return size;
}

/** Position on the unit-length beam; rounding past an end (validated to 1e-9) is clamped. */
const clampUnit = (t: number) => Math.min(1, Math.max(0, t));

function scaleLoad(load: Load, s: { length: number; force: number }): Load {
	const L = s.length;
	if (load.kind === 'point')
		return { ...load, x: clampUnit(load.x / L), value: load.value / s.force };
	const line = s.force / L;
	if (load.kind === 'uniform')
		return {
			...load,
			from: clampUnit(load.from / L),
			to: clampUnit(load.to / L),
			value: load.value / line
		};
	const { start, end } = load;
	return {
		...load,
		from: clampUnit(load.from / L),
		to: clampUnit(load.to / L),
		start: start / line,
		end: end / line
	};
}

/** Returns the dimensionless problem and the scale to undo it. */
export function normaliseProblem(problem: CollapseProblem): {
	problem: CollapseProblem;
	scale: ProblemScale;
} {
	const length = problem.beam.spans.reduce((a, b) => a + b, 0);
	let moment = 0;
	for (const c of problem.capacity) moment = Math.max(moment, c.sagging, c.hogging);
	const force = moment / length;
	const s = { length, force };
	const variableSize = measureLoadSize(problem.variableLoads) / force;
	// A variable-load set of size zero is caught before scaling; guard the division anyway.
	const lambdaScale = variableSize > 0 ? 1 / variableSize : 1;
	const capacity: CapacitySegment[] = problem.capacity.map((c) => ({
		from: c.from / length,
		to: c.to / length,
		sagging: c.sagging / moment,
		hogging: c.hogging / moment
	}));
	const variableLoads = problem.variableLoads.map((l) => {
		const scaled = scaleLoad(l, s);
		return multiplyLoad(scaled, lambdaScale);
	});
	return {
		problem: {
			beam: { ...problem.beam, spans: normaliseSpans(problem.beam.spans, length) },
			capacity,
			fixedLoads: problem.fixedLoads.map((l) => scaleLoad(l, s)),
			variableLoads
		},
		scale: { length, moment, force, lambda: lambdaScale }
	};
}

/** Spans over the total length; the last takes up the rounding so the nodes end at exactly 1. */
function normaliseSpans(spans: number[], length: number): number[] {
	const out = spans.map((s) => s / length);
	let before = 0;
	for (let i = 0; i + 1 < out.length; i++) before += out[i];
	if (out.length > 1) out[out.length - 1] = 1 - before;
	return out;
}

/** The same load multiplied by a factor. */
export function multiplyLoad(load: Load, factor: number): Load {
	if (load.kind === 'point' || load.kind === 'uniform')
		return { ...load, value: load.value * factor };
	return { ...load, start: load.start * factor, end: load.end * factor };
}
