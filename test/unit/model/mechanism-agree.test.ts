/**
 * The beam-line validation and the two solvers agree on which support and joint layouts are
 * mechanisms. The oracle is written independently: rigid pieces between simple joints, two
 * movements each (a drop and a turn), held by the supports; a beam is a mechanism when some
 * movement survives (basic statics and kinematics of rigid bodies, common practice). A fixed
 * support at a simple joint acts as a pin (the engine's rule, README "The model").
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { solveCollapse } from '../../../src/lib/engine/collapse/solve';
import { analyseElastic } from '../../../src/lib/engine/elastic/analyse';
import { validateBeamLine } from '../../../src/lib/engine/model/validate-beam';
import type { BeamLine, JointKind, SupportKind } from '../../../src/lib/engine/model/types';

/** Rank of a small matrix by elimination with partial pivoting. */
function rankOf(rows: number[][], width: number): number {
	const m = rows.map((r) => [...r]);
	let rank = 0;
	for (let col = 0; col < width && rank < m.length; col++) {
		let best = rank;
		for (let i = rank + 1; i < m.length; i++) {
			if (Math.abs(m[i][col]) > Math.abs(m[best][col])) best = i;
		}
		if (Math.abs(m[best][col]) < 1e-9) continue;
		[m[rank], m[best]] = [m[best], m[rank]];
		for (let i = rank + 1; i < m.length; i++) {
			const f = m[i][col] / m[rank][col];
			for (let j = col; j < width; j++) m[i][j] -= f * m[rank][j];
		}
		rank++;
	}
	return rank;
}

/** True when the rigid pieces of the beam can move with every support held. */
function isMechanismByPieces(beam: BeamLine): boolean {
	const n = beam.spans.length;
	const total = beam.spans.reduce((s, L) => s + L, 0);
	const x = [0];
	for (const L of beam.spans) x.push(x[x.length - 1] + L / total);
	// Piece p runs from node starts[p]; a simple joint at node k starts a new piece.
	const starts = [0];
	for (let k = 1; k < n; k++) if (beam.joints[k - 1] === 'simple') starts.push(k);
	const ends = [...starts.slice(1), n];
	const width = 2 * starts.length;
	/** Row of the deflection of node i as a point of piece p. */
	const drop = (p: number, i: number) => {
		const row = new Array<number>(width).fill(0);
		row[2 * p] = 1;
		row[2 * p + 1] = x[i] - x[starts[p]];
		return row;
	};
	const turn = (p: number) => {
		const row = new Array<number>(width).fill(0);
		row[2 * p + 1] = 1;
		return row;
	};
	const rows: number[][] = [];
	starts.forEach((a, p) => {
		for (let i = a; i <= ends[p]; i++) {
			const s = beam.supports[i];
			if (s !== 'free') rows.push(drop(p, i));
			const atSimpleJoint = (i === a && p > 0) || (i === ends[p] && p < starts.length - 1);
			if (s === 'fixed' && !atSimpleJoint) rows.push(turn(p));
		}
		if (p > 0) rows.push(drop(p - 1, a).map((v, j) => v - drop(p, a)[j]));
	});
	return rankOf(rows, width) < width;
}

const layout = fc
	.record({
		n: fc.integer({ min: 1, max: 4 }),
		supports: fc.array(fc.constantFrom<SupportKind>('pin', 'fixed', 'free'), {
			minLength: 5,
			maxLength: 5
		}),
		joints: fc.array(fc.constantFrom<JointKind>('continuous', 'simple'), {
			minLength: 3,
			maxLength: 3
		}),
		spans: fc.array(fc.integer({ min: 1, max: 9 }), { minLength: 4, maxLength: 4 })
	})
	.map(({ n, supports, joints, spans }) => {
		// `free` only at the ends, as the model requires; inner nodes pinned or fixed.
		const inner = supports.slice(1, n).map((s) => (s === 'free' ? 'pin' : s));
		return {
			spans: spans.slice(0, n).map((s) => s * 1000),
			supports: [supports[0], ...inner, supports[4]],
			joints: joints.slice(0, n - 1)
		} as BeamLine;
	});

describe('mechanisms: validation, collapse and elastic solvers agree', () => {
	it('validation refuses exactly the layouts whose rigid pieces can move', () => {
		fc.assert(
			fc.property(layout, (beam) => {
				const refused = validateBeamLine(beam).some((i) => i.severity === 'error');
				expect(refused).toBe(isMechanismByPieces(beam));
			}),
			{ numRuns: 300 }
		);
	});

	it('both solvers carry load on every layout validation accepts', () => {
		fc.assert(
			fc.property(layout, (beam) => {
				if (validateBeamLine(beam).some((i) => i.severity === 'error')) return;
				const L = beam.spans.reduce((s, v) => s + v, 0);
				const load = { kind: 'uniform', from: 0, to: L, value: 1, action: 'temporary' } as const;
				const r = solveCollapse({
					beam,
					capacity: [{ from: 0, to: L, sagging: 1e8, hogging: 1e8 }],
					fixedLoads: [],
					variableLoads: [load]
				});
				// A load over the whole beam always finds a collapse mechanism (it throws instead when
				// the problem is invalid).
				expect(r.status).toBe('mechanism');
				const EI = beam.spans.map(() => 210_000 * 8e7);
				expect(analyseElastic({ beam, EI, loads: [load] }).ok).toBe(true);
			}),
			{ numRuns: 60 }
		);
	});

	it('free / fixed / pin with a simple joint: refused (the fixed support acts as a pin)', () => {
		const beam: BeamLine = {
			spans: [2000, 4000],
			supports: ['free', 'fixed', 'pin'],
			joints: ['simple']
		};
		expect(isMechanismByPieces(beam)).toBe(true);
		expect(validateBeamLine(beam).map((i) => i.code)).toContain('beam-is-mechanism');
	});
});
