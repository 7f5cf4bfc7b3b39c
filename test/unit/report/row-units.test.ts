/**
 * JSON numbers are in the declared units everywhere: every key number of every check row is in
 * the report's unit table (kN, kNm, m, mm or a ratio), on beams that raise every kind of row
 * (invented: restrained and unrestrained spans, fixed ends with shear at the hinges, an overhang).
 * One value per unit is also converted by hand from the check's own inputs: Vpl,Rd of a
 * 305x165x40 UB in S275 = Av·fy/(√3·γM0) with Av = A − 2b·tf + (tw + 2r)·tf (EN 1993-1-1 6.2.6(3)).
 */
import { describe, expect, it } from 'vitest';
import { checkCase } from '../../../src/lib/engine/index';
import { findRowKeyUnit } from '../../../src/lib/engine/report/check-rows';

const FIXED = new Set([
	'id',
	'label',
	'clause',
	'level',
	'utilisation',
	'pass',
	'utilisationExisting',
	'multiplier',
	'x',
	'arrangement',
	'note'
]);

function report(spans: number[], supports: string[], lateral: string) {
	const total = spans.reduce((a, b) => a + b, 0);
	const out = checkCase({
		format: 'hingepoint.case',
		version: 1,
		beam: {
			spans,
			supports,
			section: { designation: 'UB 305x165x40' },
			grade: 'S275',
			restraint: { lateral }
		},
		loads: [
			{ kind: 'uniform', from: 0, to: total, value: 5, action: 'permanent' },
			{ kind: 'point', x: 1, value: 60, action: 'temporary' },
			{ kind: 'point', x: spans[0], value: 20, action: 'temporary' }
		]
	});
	if (!out.ok) throw new Error(out.issues[0].message);
	return out.report;
}

describe('check rows in declared units', () => {
	const reports = [
		report([6], ['pin', 'pin'], 'ends-only'),
		report([3.5], ['fixed', 'fixed'], 'continuous'),
		report([5, 2], ['pin', 'pin', 'free'], 'continuous'),
		report([4, 4], ['pin', 'pin', 'pin'], 'ends-only')
	];

	it('every key number is in the unit table', () => {
		const ids = new Set<string>();
		for (const r of reports) {
			for (const row of r.checks) {
				ids.add(row.id);
				for (const [k, v] of Object.entries(row)) {
					if (FIXED.has(k) || typeof v !== 'number') continue;
					expect(findRowKeyUnit(k), `${row.id}.${k}`).toBeDefined();
				}
			}
		}
		// The beams raise every kind of row, so the table is tested against all of them.
		for (const id of ['bending', 'shear', 'interaction', 'ltb', 'web', 'deflection-total'])
			expect(ids).toContain(id);
	});

	it('shear resistance is in kN: Vpl,Rd = Av·fy/(√3·γM0) (EN 1993-1-1 6.2.6)', () => {
		const r = reports[0];
		const d = r.sections[0].dims as { h: number; b: number; tw: number; tf: number; r: number };
		const A = r.sections[0].props!.A;
		const Av = Math.max(A - 2 * d.b * d.tf + (d.tw + 2 * d.r) * d.tf, d.h * d.tw - 2 * d.tf * d.tw);
		const shear = r.checks.find((c) => c.id === 'shear')!;
		expect(Math.abs((shear.vRd as number) / ((Av * 275) / Math.sqrt(3) / 1000) - 1)).toBeLessThan(
			1e-9
		);
	});
});
