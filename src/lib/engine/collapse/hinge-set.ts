/**
 * From raw dual values to a clean hinge set: drop rounding-level hinges, merge a hinge found at
 * several nearby points into one at the exact peak of the field, and make the rotations exactly
 * compatible with the supports (the nearest compatible set to the dual's, by least squares over
 * the mechanisms these hinges allow).
 */
import type { BeamLine } from '../model/types';
import { findStationaryPoints } from './extremes';
import { solveEquilibrium, solveSquare } from './nullspace';
import { computeNodePositions, evaluateMoment, type FieldModel } from './statics';
import type { Interval, Station } from './stations';
import type { Kink } from './virtual-work';

/** A hinge with both resistances at its position (its sense may still change by projection). */
export interface HingeCandidate extends Kink {
	sag: number;
	hog: number;
}

/** Points closer than this (beam length 1) are one hinge. */
const CLUSTER = 1e-6;

/** Merges nearby hinges of one sense into one at the exact peak (or station) they straddle. */
export function consolidateHinges(options: {
	model: FieldModel;
	z: number[];
	stations: Station[];
	intervals: Interval[];
	raw: HingeCandidate[];
}): HingeCandidate[] {
	const { model, z, stations, intervals, raw } = options;
	const largest = Math.max(0, ...raw.map((h) => Math.abs(h.rotation)));
	const kept = raw.filter((h) => Math.abs(h.rotation) > 1e-8 * largest);
	const clusters: HingeCandidate[][] = [];
	for (const h of kept) {
		const last = clusters[clusters.length - 1]?.at(-1);
		const same =
			last &&
			last.side === h.side &&
			Math.sign(last.rotation) === Math.sign(h.rotation) &&
			h.x - last.x <= CLUSTER;
		if (same) clusters[clusters.length - 1].push(h);
		else clusters.push([h]);
	}
	return clusters.map((c) => {
		const rotation = c.reduce((s, h) => s + h.rotation, 0);
		const main = c.reduce((a, b) => (Math.abs(b.rotation) > Math.abs(a.rotation) ? b : a));
		const atStation = c.find((h) => stations.some((s) => s.x === h.x));
		if (atStation) return { ...atStation, rotation };
		const iv = intervals.find((i) => main.x > i.from && main.x < i.to);
		const peaks = iv ? findStationaryPoints(model, z, iv) : [];
		const sense = Math.sign(rotation);
		const best = peaks
			.filter(
				(x) =>
					Math.sign(evaluateMoment(model, z, x, -1)) === sense && Math.abs(x - main.x) <= CLUSTER
			)
			.sort((a, b) => Math.abs(a - main.x) - Math.abs(b - main.x))[0];
		return { ...main, x: best ?? main.x, rotation };
	});
}

/** Rows of the support conditions over u = [θ…, offset, slope, joint rotations…]. */
function buildCompatibilityRows(beam: BeamLine, hinges: Kink[]): number[][] {
	const X = computeNodePositions(beam);
	const n = beam.spans.length;
	const joints: Kink[] = [];
	for (let k = 1; k < n; k++) {
		if (beam.joints[k - 1] !== 'simple') continue;
		joints.push({ x: X[k], side: -1, rotation: 0 });
		if (beam.supports[k] === 'fixed') joints.push({ x: X[k], side: 1, rotation: 0 });
	}
	const all = [...hinges, ...joints];
	const rows: number[][] = [];
	beam.supports.forEach((s, node) => {
		if (s === 'free') return;
		const x = X[node];
		rows.push([
			...all.map((k) => (k.x < x ? -(x - k.x) : 0)).slice(0, hinges.length),
			1,
			x,
			...joints.map((j) => (j.x < x ? -(x - j.x) : 0))
		]);
		if (s !== 'fixed') return;
		const before = (k: Kink) =>
			node === n ? true : node === 0 ? false : k.x < x || (k.x === x && k.side < 0);
		rows.push([
			...hinges.map((k) => (before(k) ? -1 : 0)),
			0,
			1,
			...joints.map((j) => (before(j) ? -1 : 0))
		]);
	});
	return rows;
}

/** The compatible rotations nearest (least squares) to the given ones. */
export function makeCompatible(beam: BeamLine, hinges: HingeCandidate[]): HingeCandidate[] {
	const H = hinges.length;
	if (H === 0) return hinges;
	const rows = buildCompatibilityRows(beam, hinges);
	const space = solveEquilibrium(
		rows,
		rows.map(() => 0)
	);
	const modes = space.basis.map((v) => v.slice(0, H));
	if (modes.length === 0) return hinges.map((h) => ({ ...h, rotation: 0 }));
	const target = hinges.map((h) => h.rotation);
	const dot = (a: number[], b: number[]) => a.reduce((s, v, i) => s + v * b[i], 0);
	const G = modes.map((a) => modes.map((b) => dot(a, b)));
	const coef = solveSquare(
		G,
		modes.map((a) => dot(a, target))
	);
	if (!coef) return hinges;
	return hinges.map((h, i) => ({
		...h,
		rotation: modes.reduce((s, m, k) => s + coef[k] * m[i], 0)
	}));
}
