/**
 * Kinematic check: can the beam line move as a set of rigid pieces without bending? If so the
 * stiffness matrix is singular and the beam is a mechanism (it cannot carry load elastically).
 */
import type { BeamLine } from '../model/types';
import type { InputIssue } from '../model/issue';
import { computeRank } from './linear-solve';

/**
 * Issues for a beam line that is a mechanism; empty when it is stable. Unknowns are the node
 * deflections of a rigid-piece motion; constraints are supports, and equal slopes across
 * continuous joints and at fixed supports.
 * @example
 * findMechanismIssues({ spans: [6000], supports: ['pin', 'free'], joints: [] }).length // 1
 */
export function findMechanismIssues(beam: BeamLine): InputIssue[] {
	const n = beam.spans.length;
	const Lref = beam.spans.reduce((s, L) => s + L, 0) / Math.max(1, n);
	// Slope of span e times Lref, as a row over node deflections.
	const slope = (e: number): number[] => {
		const row = new Array<number>(n + 1).fill(0);
		row[e] = -Lref / beam.spans[e];
		row[e + 1] = Lref / beam.spans[e];
		return row;
	};
	const rows: number[][] = [];
	beam.supports.forEach((kind, i) => {
		if (kind === 'free') return;
		const row = new Array<number>(n + 1).fill(0);
		row[i] = 1;
		rows.push(row);
		if (kind === 'fixed') {
			if (i > 0) rows.push(slope(i - 1));
			if (i < n) rows.push(slope(i));
		}
	});
	beam.joints.forEach((kind, j) => {
		if (kind !== 'continuous') return;
		rows.push(slope(j).map((v, k) => v - slope(j + 1)[k]));
	});
	if (rows.length > 0 && computeRank(rows) === n + 1) return [];
	return [
		{
			path: 'beam.supports',
			code: 'beam-is-mechanism',
			severity: 'error',
			message:
				'The beam can move without bending: add a support, fix an end or make a joint continuous.'
		}
	];
}
