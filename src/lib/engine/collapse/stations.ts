/**
 * Stations and intervals of a beam line. Between two neighbouring stations the loads are smooth
 * (no point load, no load end, no node, no change of section), so the moment there is a
 * polynomial of degree three at most and its extremes can be found exactly.
 */
import type { CapacitySegment, Load } from '../model/types';
import type { Side } from './load-effects';
import type { FieldModel } from './statics';

/** A point where the moment must be checked; `side` ±1 marks one side of a moment jump. */
export interface Station {
	x: number;
	side: Side;
	/** Sagging and hogging resistance there (the weaker side governs at a break). */
	sag: number;
	hog: number;
}

/** An open interval between neighbouring stations with its (constant) resistance. */
export interface Interval {
	from: number;
	to: number;
	sag: number;
	hog: number;
	/** True when a line load acts somewhere on it, so the moment may peak inside. */
	loaded: boolean;
}

/** Resistance at x: the weaker of the segments that touch x. */
export function findCapacityAt(
	capacity: CapacitySegment[],
	x: number,
	tol = 0
): { sag: number; hog: number } {
	let sag = Infinity;
	let hog = Infinity;
	for (const c of capacity) {
		if (x < c.from - tol || x > c.to + tol) continue;
		sag = Math.min(sag, c.sagging);
		hog = Math.min(hog, c.hogging);
	}
	if (!Number.isFinite(sag) || !Number.isFinite(hog))
		throw new Error(`invariant: no capacity at x = ${x}`);
	return { sag, hog };
}

function collectBreaks(model: FieldModel, capacity: CapacitySegment[]): number[] {
	const xs: number[] = [...model.nodeX];
	const loads: Load[] = [...model.fixedLoads, ...model.variableLoads];
	for (const l of loads) {
		if (l.kind === 'point') xs.push(l.x);
		else xs.push(l.from, l.to);
	}
	for (const c of capacity) xs.push(c.from, c.to);
	const L = model.nodeX[model.nodeX.length - 1];
	xs.sort((a, b) => a - b);
	// Merge positions closer than a billionth of the length: they are the same point.
	const merged: number[] = [];
	for (const x of xs) {
		const c = Math.min(Math.max(x, 0), L);
		if (merged.length === 0 || c - merged[merged.length - 1] > 1e-9 * L) merged.push(c);
	}
	// A node wins over a load or section break merged into it, so jumps sit exactly at nodes.
	for (const X of model.nodeX) {
		let best = 0;
		for (let i = 1; i < merged.length; i++)
			if (Math.abs(merged[i] - X) < Math.abs(merged[best] - X)) best = i;
		merged[best] = X;
	}
	return merged;
}

/** Stations (every break, both sides of a fixed interior support) and the intervals between. */
export function buildStations(
	model: FieldModel,
	capacity: CapacitySegment[]
): { stations: Station[]; intervals: Interval[] } {
	const xs = collectBreaks(model, capacity);
	const n = model.beam.spans.length;
	// Segment ends given in other units may miss the beam ends by rounding.
	const tol = 1e-9 * model.nodeX[n];
	const jumpAt = new Set<number>();
	for (let k = 1; k < n; k++) if (model.beam.supports[k] === 'fixed') jumpAt.add(model.nodeX[k]);
	const stations: Station[] = [];
	for (const x of xs) {
		const cap = findCapacityAt(capacity, x, tol);
		if (jumpAt.has(x)) {
			stations.push({ x, side: -1, ...cap }, { x, side: 1, ...cap });
		} else stations.push({ x, side: -1, ...cap });
	}
	const loads = [...model.fixedLoads, ...model.variableLoads];
	const intervals: Interval[] = [];
	for (let i = 0; i + 1 < xs.length; i++) {
		const from = xs[i];
		const to = xs[i + 1];
		const mid = (from + to) / 2;
		const cap = findCapacityAt(capacity, mid, tol);
		const loaded = loads.some(
			(l) =>
				l.kind !== 'point' &&
				l.from < mid &&
				l.to > mid &&
				(l.kind === 'uniform' ? l.value !== 0 : l.start !== 0 || l.end !== 0)
		);
		intervals.push({ from, to, sag: cap.sag, hog: cap.hog, loaded });
	}
	return { stations, intervals };
}
