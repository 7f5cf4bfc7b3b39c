import { nodePositions } from './scale';

/** The beam line as the mechanism drawing needs it (m). */
export interface MechanismInput {
	spans: readonly number[];
	supports: readonly ('pin' | 'fixed' | 'free')[];
	joints: readonly ('continuous' | 'simple')[];
	/** Hinge positions, m. */
	hinges: readonly number[];
}

interface KeyPoint {
	x: number;
	held: boolean;
	kink: boolean;
	clamped: boolean;
}

/**
 * The collapse mechanism as a drawing: rigid straight pieces that turn only at the hinges (and at
 * simple joints), held at the supports. Geometry only — the hinge positions come from the engine.
 * Returns the kinked line as points (x in m, v downward, largest |v| = 1), or null when the
 * hinges given do not make a mechanism.
 * @example
 * computeMechanismShape({ spans: [6], supports: ['pin','pin'], joints: [], hinges: [3] })
 * // [{x:0,v:0},{x:3,v:1},{x:6,v:0}]
 */
export function computeMechanismShape(input: MechanismInput): { x: number; v: number }[] | null {
	const points = collectKeyPoints(input);
	const n = points.length;
	const rows: number[][] = [];
	points.forEach((p, k) => {
		if (p.held) rows.push(unit(n, k, 1));
		if (p.clamped) {
			// Zero slope at a built-in end with no hinge: the neighbour does not move either.
			const next = k === 0 ? 1 : n - 2;
			rows.push(unit(n, next, 1));
		}
		if (k > 0 && k < n - 1 && !p.kink) {
			const a = points[k - 1];
			const c = points[k + 1];
			const row = new Array(n).fill(0);
			row[k - 1] = 1 / (p.x - a.x);
			row[k] = -1 / (p.x - a.x) - 1 / (c.x - p.x);
			row[k + 1] = 1 / (c.x - p.x);
			rows.push(row);
		}
	});
	const v = findNullVector(rows, n);
	if (!v) return null;
	const peak = v.reduce((best, value) => (Math.abs(value) > Math.abs(best) ? value : best), 0);
	// Fold −0 into 0 so a held point reads as exactly still.
	return points.map((p, k) => ({ x: p.x, v: v[k] / peak || 0 }));
}

function collectKeyPoints(input: MechanismInput): KeyPoint[] {
	const xs = nodePositions(input.spans);
	const length = xs[xs.length - 1];
	const near = (a: number, b: number) => Math.abs(a - b) <= 1e-6 * length;
	const points: KeyPoint[] = xs.map((x, i) => {
		const hinge = input.hinges.some((h) => near(h, x));
		const simple = i > 0 && i < xs.length - 1 && input.joints[i - 1] === 'simple';
		const end = i === 0 || i === xs.length - 1;
		return {
			x,
			held: input.supports[i] !== 'free',
			kink: hinge || simple,
			clamped: end && input.supports[i] === 'fixed' && !hinge
		};
	});
	for (const h of input.hinges) {
		if (!xs.some((x) => near(h, x))) points.push({ x: h, held: false, kink: true, clamped: false });
	}
	return points.sort((a, b) => a.x - b.x);
}

function unit(n: number, k: number, value: number): number[] {
	const row = new Array(n).fill(0);
	row[k] = value;
	return row;
}

// Gauss–Jordan elimination; one free unknown set to 1 gives a non-zero solution of A·v = 0.
function findNullVector(rows: number[][], n: number): number[] | null {
	const a = rows.map((row) => [...row]);
	const pivotCol: number[] = [];
	let r = 0;
	for (let col = 0; col < n && r < a.length; col++) {
		let best = r;
		for (let i = r + 1; i < a.length; i++)
			if (Math.abs(a[i][col]) > Math.abs(a[best][col])) best = i;
		if (Math.abs(a[best][col]) < 1e-9) continue;
		[a[r], a[best]] = [a[best], a[r]];
		const p = a[r][col];
		for (let j = 0; j < n; j++) a[r][j] /= p;
		for (let i = 0; i < a.length; i++) {
			if (i === r || a[i][col] === 0) continue;
			const f = a[i][col];
			for (let j = 0; j < n; j++) a[i][j] -= f * a[r][j];
		}
		pivotCol.push(col);
		r++;
	}
	const free = [...Array(n).keys()].filter((col) => !pivotCol.includes(col));
	if (free.length === 0) return null;
	const v = new Array(n).fill(0);
	v[free[0]] = 1;
	pivotCol.forEach((col, i) => (v[col] = -a[i][free[0]]));
	return v.some((value) => Math.abs(value) > 1e-9) ? v : null;
}
