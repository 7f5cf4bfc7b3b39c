/**
 * AISC 360-22 B4.2 (design wall thickness of HSS): "the design wall thickness, t, shall be taken
 * as 0.93 times the nominal wall thickness" for electric-resistance-welded ASTM A500 tubes, and
 * equal to the nominal wall thickness for ASTM A1085 tubes (from memory of the clause's wording).
 * The case file's grade decides the wall: the same tube with A1085 is designed on the nominal wall.
 * Expected properties are computed here from the tube's closed forms (ro = 2t, ri = t, as the
 * AISC Shapes Database takes them): rounded rectangle A = BH − (4 − π)r², plastic modulus
 * Z = BH²/4 − (4 − π)r²(H/2 − c·r), c = (10 − 3π)/(12 − 3π) the spandrel centroid (outer minus
 * inner outline); round tube A = π(d − t)t, Z = (d³ − (d − 2t)³)/6.
 * Nominal sizes of HSS8x6x1/2 and HSS6.625x0.280 from their designations (AISC Shapes Database v15.0).
 */
import { describe, expect, it } from 'vitest';
import { checkCase, type CheckReport } from '../../src/lib/engine/index';
import type { ChsDims, RhsDims } from '../../src/lib/engine/section/types';
import { US } from '../../src/lib/engine/units';
import { expectRel } from '../support/expect-rel';

const IN = US.inToMm;
const C = (10 - 3 * Math.PI) / (12 - 3 * Math.PI);

/** Area and plastic modulus of a B × H rounded rectangle with corner radius r (solid). */
function roundedRect(B: number, H: number, r: number): { A: number; Z: number } {
	const spandrels = (4 - Math.PI) * r ** 2;
	return { A: B * H - spandrels, Z: (B * H ** 2) / 4 - spandrels * (H / 2 - C * r) };
}

/** A, Z (major axis, depth h) of a rectangular tube of wall t with ro = 2t, ri = t. */
function rectTube(h: number, b: number, t: number): { A: number; Z: number } {
	const outer = roundedRect(b, h, 2 * t);
	const inner = roundedRect(b - 2 * t, h - 2 * t, t);
	return { A: outer.A - inner.A, Z: outer.Z - inner.Z };
}

/** A, Z of a round tube of outside diameter d and wall t. */
function roundTube(d: number, t: number): { A: number; Z: number } {
	return { A: Math.PI * (d - t) * t, Z: (d ** 3 - (d - 2 * t) ** 3) / 6 };
}

function tubeCase(designation: string, grade: string, loss = 0) {
	return {
		format: 'hingepoint.case',
		version: 1,
		title: 'DEMO — invented tube',
		basis: 'aisc-lrfd',
		beam: {
			spans: [3.6],
			supports: ['pin', 'pin'],
			section: { designation },
			grade,
			sectionLoss: loss,
			restraint: { lateral: 'continuous' }
		},
		loads: [{ kind: 'point', x: 1.8, value: 10, action: 'temporary' }]
	};
}

function reportOf(json: unknown, units: 'si' | 'us' = 'si'): CheckReport {
	const out = checkCase(json, { units });
	if (!out.ok) throw new Error(out.issues.map((i) => `${i.path}: ${i.message}`).join('; '));
	return out.report;
}

describe('AISC 360-22 B4.2: the grade decides the design wall of a US tube', () => {
	const [h, b, tNom] = [8 * IN, 6 * IN, 0.5 * IN];

	it('HSS8x6x1/2: A500 Gr C on 0.93t, A1085 on t, A and Z as the closed form gives', () => {
		const a500 = reportOf(tubeCase('HSS8x6x1/2', 'A500-C')).sections[0];
		const a1085 = reportOf(tubeCase('HSS8x6x1/2', 'A1085')).sections[0];
		expectRel((a500.dims as RhsDims).t, 0.93 * tNom, 1e-12);
		expectRel((a1085.dims as RhsDims).t, tNom, 1e-12);
		const thin = rectTube(h, b, 0.93 * tNom);
		const full = rectTube(h, b, tNom);
		expectRel(a500.props!.A, thin.A, 1e-9);
		expectRel(a500.props!.Wply, thin.Z, 1e-9);
		expectRel(a1085.props!.A, full.A, 1e-9);
		expectRel(a1085.props!.Wply, full.Z, 1e-9);
		// The ratio B4.2 implies, not exactly 1/0.93: the corner radii follow the wall too.
		expectRel(a1085.props!.A / a500.props!.A, full.A / thin.A, 1e-9);
		expectRel(a1085.props!.Wply / a500.props!.Wply, full.Z / thin.Z, 1e-9);
		expect(a1085.props!.A / a500.props!.A).toBeGreaterThan(1.06);
	});

	it('HSS6.625x0.280: the round tube the same way, and a larger allowed load on A1085', () => {
		const [d, t] = [6.625 * IN, 0.28 * IN];
		const a500 = reportOf(tubeCase('HSS6.625x0.280', 'A500-C'));
		const a1085 = reportOf(tubeCase('HSS6.625x0.280', 'A1085'));
		expectRel((a1085.sections[0].dims as ChsDims).t, t, 1e-12);
		expectRel(a500.sections[0].props!.A, roundTube(d, 0.93 * t).A, 1e-9);
		expectRel(a1085.sections[0].props!.A, roundTube(d, t).A, 1e-9);
		expectRel(a1085.sections[0].props!.Wply, roundTube(d, t).Z, 1e-9);
		expect(a1085.answer.multiplier!).toBeGreaterThan(a500.answer.multiplier!);
	});

	it('the report says which wall was used, in the reader’s units', () => {
		const a1085 = reportOf(tubeCase('HSS8x6x1/2', 'A1085'), 'us').assumptions;
		expect(a1085).toContain(
			'HSS8x6x1/2: design wall = the nominal wall 0.5 in, as AISC 360-22 B4.2 takes for ASTM A1085 tubes.'
		);
		const a500 = reportOf(tubeCase('HSS8x6x1/2', 'A500-C'), 'si').assumptions.join('\n');
		// 0.93 × 12.7 mm = 11.811 mm, 3 significant figures.
		expect(a500).toContain('design wall 0.93 × the nominal wall 12.7 mm = 11.8 mm');
		const open = reportOf({ ...tubeCase('W12x26', 'A992') }).assumptions.join('\n');
		expect(open).not.toContain('design wall');
	});

	it('a section loss comes off the wall the grade gives (hollow sections lose c outside only)', () => {
		const loss = 1;
		const r = reportOf(tubeCase('HSS8x6x1/2', 'A1085', loss));
		expectRel((r.sections[0].dims as RhsDims).t, tNom - loss, 1e-12);
		expect(r.assumptions.join('\n')).toContain('The section loss is taken off this wall.');
	});

	it('a European tube with an A1085 grade keeps its own wall (B4.2 is for US HSS)', () => {
		const r = reportOf(tubeCase('SHS 100x100x5.0', 'A1085'));
		expect((r.sections[0].dims as RhsDims).t).toBe(5);
	});
});
