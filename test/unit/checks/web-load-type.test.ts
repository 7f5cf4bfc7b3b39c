/**
 * Which load type of EN 1993-1-5 Figure 6.1 each web row uses, and our cautious rule for "near
 * an end": type (c) while c < max(hw, le6), le6 = 6·E·tw²/(2·fyw·hw) (eq. 6.13 with kF at its cap
 * of 6). Equation numbers from memory of EN 1993-1-5:2006 section 6. Sections: 457x191x67 UB
 * (hw = 453.4 − 2·12.7 = 428 mm, tw 8.5) and 305x165x40 UB (hw = 303.4 − 2·10.2 = 283 mm,
 * tw 6), BS 4-1 dimensions from memory, S275.
 */
import { describe, expect, it } from 'vitest';
import {
	computeWebForceResistance,
	computeWebResistance,
	typeCReach
} from '../../../src/lib/engine/checks/en1993/web';
import type { DesignCheckInput } from '../../../src/lib/engine/checks/inputs';
import { runDesignChecks } from '../../../src/lib/engine/checks/run-checks';
import { resolveGrade } from '../../../src/lib/engine/material/index';
import type { BeamLine, Load } from '../../../src/lib/engine/model/types';
import { resolveSection } from '../../../src/lib/engine/section/index';
import { expectRel } from '../../support/expect-rel';

const E = 210_000;
const deep = { hw: 428, tw: 8.5, bf: 189.9, tf: 12.7, fyw: 275, fyf: 275, E, gammaM1: 1 };
const shallow = { hw: 283, tw: 6, bf: 165, tf: 10.2, fyw: 275, fyf: 275, E, gammaM1: 1 };

describe('reach of an unstiffened end (our cautious rule)', () => {
	it('is hw when le6 is shorter, le6 when it is longer', () => {
		// 457 UB: le6 = 6·210000·8.5²/(2·275·428) = 386.7 mm < hw = 428 mm.
		expectRel(typeCReach(deep), 428, 1e-12);
		// 305 UB: le6 = 6·210000·6²/(2·275·283) = 291.4 mm > hw = 283 mm.
		expectRel(typeCReach(shallow), (6 * E * 36) / (2 * 275 * 283), 1e-12);
		expectRel(typeCReach(shallow), 291.4, 1e-3);
	});

	it('beyond the reach type (c) no longer depends on c (kF capped, le uncapped)', () => {
		for (const s of [deep, shallow]) {
			const reach = typeCReach(s);
			const at = computeWebResistance({ ...s, type: 'c', ss: 0, c: reach });
			const far = computeWebResistance({ ...s, type: 'c', ss: 0, c: 1e6 });
			expect(at.kF).toBe(6);
			expect(at.fRd).toBe(far.fRd);
			const inside = computeWebResistance({ ...s, type: 'c', ss: 0, c: 0.5 * s.hw });
			expect(inside.fRd).toBeLessThan(at.fRd);
		}
	});

	it('a force just inside the reach is type (c), at the reach type (a)', () => {
		const reach = typeCReach(deep);
		const base = { ...deep, ss: 40, throughWeb: false };
		const inside = computeWebForceResistance({ ...base, endDistance: reach - 1 });
		const at = computeWebForceResistance({ ...base, endDistance: reach });
		expect(inside.type).toBe('c');
		expect(inside.c).toBe(reach - 1);
		expect(at.type).toBe('a');
		expect(at.fRd).toBe(computeWebResistance({ ...deep, ss: 40, type: 'a' }).fRd);
	});

	it('a force over a support near an end takes the lower of (b) and (c)', () => {
		const base = { ...deep, ss: 40, throughWeb: true };
		const b = computeWebResistance({ ...deep, ss: 40, type: 'b' }).fRd;
		const c0 = computeWebResistance({ ...deep, ss: 40, type: 'c', c: 0 }).fRd;
		const c300 = computeWebResistance({ ...deep, ss: 40, type: 'c', c: 300 }).fRd;
		// kF(c, c = 0) = 2 + 6·40/428 = 2.56 < 3.5: (c) is lower at a plain end.
		expect(c0).toBeLessThan(b);
		expect(computeWebForceResistance({ ...base, endDistance: 0 }).fRd).toBe(c0);
		// kF(c, c = 300) = 2 + 6·340/428 = 6.77 → 6; le = min(386.7, 340) = 340: (c) is higher.
		expect(c300).toBeGreaterThan(b);
		const far = computeWebForceResistance({ ...base, endDistance: 300 });
		expect(far.type).toBe('b');
		expect(computeWebForceResistance({ ...base, endDistance: 1e4 }).type).toBe('b');
	});
});

function run(beam: BeamLine, loads: Load[], bearing: { supports: number; loads: number }) {
	const s = resolveSection({ designation: 'UB 457x191x67' }, { loss: 0 });
	const g = s.ok ? resolveGrade('S275', s.value.governingThickness) : null;
	if (!s.ok || !g?.ok) throw new Error('section or grade');
	const input: DesignCheckInput = {
		beam,
		sections: beam.spans.map(() => s.value),
		grades: beam.spans.map(() => g.value),
		loads,
		factors: { set: 'en1990-6.10' },
		restraint: null,
		loadHeight: 'shear-centre',
		bearing: { supports: beam.supports.map(() => bearing.supports), loads: bearing.loads }
	};
	return runDesignChecks(input).checks.filter((c) => c.id === 'web');
}

const q = (x: number): Load => ({ kind: 'point', x, value: 50e3, action: 'temporary' });

describe('web rows name their type from the geometry', () => {
	it('end reactions are type (c) with c = 0; an unloaded interior support is type (a)', () => {
		const rows = run(
			{ spans: [4000, 4000], supports: ['pin', 'pin', 'pin'], joints: ['continuous'] },
			[q(2000), q(6000)],
			{ supports: 100, loads: 40 }
		);
		expect(rows.map((r) => r.label)).toEqual([
			'Web at support 1 (type c, end support)',
			'Web at support 2 (type a)',
			'Web at support 3 (type c, end support)',
			'Web under point load 1 (type a)',
			'Web under point load 2 (type a)'
		]);
		expect(rows[0].values.c).toBe(0);
		expect(rows[0].values.kF).toBe(2 + (6 * 100) / 428);
	});

	it('a cantilever root support: type (c) with a short overhang, (a) with a long one', () => {
		// Bearing 150 mm centred on the support: c = overhang − 75 mm; reach 428 mm.
		const short = run(
			{ spans: [4000, 300], supports: ['pin', 'pin', 'free'], joints: ['continuous'] },
			[q(4300)],
			{ supports: 150, loads: 40 }
		);
		expect(short[1].label).toBe('Web at support 2 (type c, near the free end)');
		expect(short[1].values.c).toBe(225);
		const long = run(
			{ spans: [4000, 600], supports: ['pin', 'pin', 'free'], joints: ['continuous'] },
			[q(4600)],
			{ supports: 150, loads: 40 }
		);
		expect(long[1].label).toBe('Web at support 2 (type a)');
		// A load at the very tip is type (c) with c = 0.
		expect(long[2].label).toBe('Web under point load 1 (type c, near the free end)');
		expect(long[2].values.c).toBe(0);
	});

	it('a load over an end support is one row, the lower of (b) and (c)', () => {
		const rows = run({ spans: [4000], supports: ['pin', 'pin'], joints: [] }, [q(0), q(2000)], {
			supports: 100,
			loads: 40
		});
		// ss = the shorter bearing, 40 mm; kF(c) = 2 + 6·40/428 = 2.56 < 3.5, so (c) governs.
		expect(rows[0].label).toBe('Web at support 1 (type c, end support)');
		expect(rows[0].values.ss).toBe(40);
		expect(rows.filter((r) => r.label.includes('point load'))).toHaveLength(1);
	});

	it('a built-in end has no bearing row; a load near it counts the end as unstiffened', () => {
		const rows = run({ spans: [4000], supports: ['fixed', 'pin'], joints: [] }, [q(200)], {
			supports: 100,
			loads: 40
		});
		expect(rows.map((r) => r.label)).toEqual([
			'Web at support 2 (type c, end support)',
			'Web under point load 1 (type c, near the built-in end)'
		]);
	});
});
