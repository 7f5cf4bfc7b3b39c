/**
 * The kinematic side of the certificate, computed independently of the linear program: from the
 * hinge rotations alone, rebuild the displacement field of the mechanism (rigid pieces between
 * hinges, zero deflection at supports, zero slope at fixed supports, free rotation at simple
 * joints) and evaluate the external work of the loads through it.
 */
import type { BeamLine, Load } from '../model/types';
import type { Side } from './load-effects';
import { computeNodePositions } from './statics';
import { solveSquare } from './nullspace';

/** A concentrated rotation of the mechanism: the slope of δ drops by `rotation` at x. */
export interface Kink {
	x: number;
	/** −1: before a node's support, +1: after it (only matters at fixed supports). */
	side: Side;
	/** Sagging positive (downward deflection δ peaks at a sagging hinge). */
	rotation: number;
}

/** Displacement field of a mechanism, δ downward positive. */
export interface Displacement {
	kinks: Kink[];
	offset: number;
	slope: number;
	/** Largest violation of a support condition, relative to Σ|θ|·L. */
	compatibilityError: number;
}

function isBefore(k: Kink, x: number, side: Side): boolean {
	return k.x < x || (k.x === x && k.side < side);
}

/** δ(x) of the mechanism. */
export function evaluateDisplacement(d: Displacement, x: number): number {
	let v = d.offset + d.slope * x;
	for (const k of d.kinks) if (k.x < x) v -= k.rotation * (x - k.x);
	return v;
}

/** Builds δ from the hinge rotations, solving for rigid-body motion and simple-joint rotations. */
export function buildDisplacement(beam: BeamLine, hinges: Kink[]): Displacement {
	const X = computeNodePositions(beam);
	const n = beam.spans.length;
	const joints: Kink[] = [];
	for (let k = 1; k < n; k++) {
		if (beam.joints[k - 1] !== 'simple') continue;
		joints.push({ x: X[k], side: -1, rotation: 0 });
		if (beam.supports[k] === 'fixed') joints.push({ x: X[k], side: 1, rotation: 0 });
	}
	// Rows: [offset, slope, joint rotations…] · q = known part from the hinges.
	const rows: number[][] = [];
	const rhs: number[] = [];
	const deflectionRow = (x: number) => {
		rows.push([1, x, ...joints.map((j) => (j.x < x ? -(x - j.x) : 0))]);
		let known = 0;
		for (const h of hinges) if (h.x < x) known += h.rotation * (x - h.x);
		rhs.push(known);
	};
	const slopeRow = (x: number, side: Side | 2) => {
		const after = (k: Kink) => (side === 2 ? k.x <= x : isBefore(k, x, side as Side));
		rows.push([0, 1, ...joints.map((j) => (after(j) ? -1 : 0))]);
		rhs.push(hinges.reduce((s, h) => s + (after(h) ? h.rotation : 0), 0));
	};
	beam.supports.forEach((s, node) => {
		if (s === 'free') return;
		deflectionRow(X[node]);
		if (s !== 'fixed') return;
		if (node === 0) slopeRow(0, -1);
		else if (node === n) slopeRow(X[n], 2);
		else slopeRow(X[node], 1);
	});
	// Least squares through the normal equations: the system is small and of full column rank.
	const p = 2 + joints.length;
	const N = Array.from({ length: p }, (_, i) =>
		Array.from({ length: p }, (_, j) => rows.reduce((s, r) => s + r[i] * r[j], 0))
	);
	const b = Array.from({ length: p }, (_, i) => rows.reduce((s, r, k) => s + r[i] * rhs[k], 0));
	const q = solveSquare(N, b);
	if (!q) throw new Error('invariant: mechanism displacement is not determined (unstable beam)');
	joints.forEach((j, i) => (j.rotation = q[2 + i]));
	const scale = hinges.reduce((s, h) => s + Math.abs(h.rotation), 0) * X[n] || 1;
	let error = 0;
	rows.forEach((r, k) => {
		const lhs = r.reduce((s, v, i) => s + v * q[i], 0);
		error = Math.max(error, Math.abs(lhs - rhs[k]) / scale);
	});
	const kinks = [...hinges, ...joints].sort((a, b) => a.x - b.x || a.side - b.side);
	return { kinks, offset: q[0], slope: q[1], compatibilityError: error };
}

/** External work of the loads through δ (exact: δ is piecewise linear, loads at most linear). */
export function computeExternalWork(d: Displacement, loads: Load[]): number {
	let work = 0;
	for (const load of loads) {
		if (load.kind === 'point') {
			work += load.value * evaluateDisplacement(d, load.x);
			continue;
		}
		const a = load.from;
		const b = load.to;
		const s0 = load.kind === 'uniform' ? load.value : load.start;
		const s1 = load.kind === 'uniform' ? load.value : load.end;
		const w = (x: number) => s0 + ((s1 - s0) * (x - a)) / (b - a);
		const cuts = [a, ...d.kinks.map((k) => k.x).filter((x) => x > a && x < b), b];
		for (let i = 0; i + 1 < cuts.length; i++) {
			const [u, v] = [cuts[i], cuts[i + 1]];
			const m = (u + v) / 2;
			// Simpson's rule is exact for the product of two linear functions.
			const f = (x: number) => w(x) * evaluateDisplacement(d, x);
			work += ((v - u) / 6) * (f(u) + 4 * f(m) + f(v));
		}
	}
	return work;
}
