/**
 * AISC 360-22 J10.2 (from memory of the text): web local yielding uses Rn = Fyw·tw·(5k + lb)
 * (J10-2) when the force is farther than d from the member end, Rn = Fyw·tw·(2.5k + lb) (J10-3)
 * otherwise. Our cautious reading measures that distance to the near edge of the bearing, so a
 * bearing that starts within d of the end takes J10-3 even when its centre is beyond d.
 */
import { describe, expect, it } from 'vitest';
import { computeAiscWebReading } from '../../../../src/lib/engine/checks/aisc360/web-strength';
import type { WebForceInput } from '../../../../src/lib/engine/checks/basis-types';

// A W18x50-like web (inches converted exactly: 1 in = 25.4 mm, NIST SP 811), Fy = 345 MPa.
const IN = 25.4;
const web: WebForceInput = {
	h: 18.0 * IN,
	hw: (18.0 - 2 * 0.57) * IN,
	tw: 0.355 * IN,
	bf: 7.5 * IN,
	tf: 0.57 * IN,
	r: 0.4 * IN,
	Wel: 88.9 * IN ** 3,
	fyw: 345,
	fyf: 345,
	E: 199_948,
	ss: 200,
	throughWeb: true,
	endDistance: 0,
	resistance: { section: 0.9, member: 0.9 },
	unbracedLength: 0,
	loadedFlangeCompressed: true
};

describe('AISC J10.2 end distance measured to the near edge of the bearing', () => {
	it('a bearing starting 0.9d from the end, centre beyond d, takes J10-3 (2.5k)', () => {
		const d = web.h;
		const near = { ...web, endDistance: 0.9 * d, ss: 0.4 * d };
		const reading = computeAiscWebReading(near, 'lrfd', 345 * web.Wel);
		const k = web.tf + web.r;
		const j10_3 = 1.0 * web.fyw * web.tw * (2.5 * k + near.ss); // φ = 1.00
		expect(reading.fRd).toBeLessThanOrEqual(j10_3 * (1 + 1e-12));
		expect(reading.note).toContain(`${Math.round(0.9 * d)} mm from the member end`);
	});

	it('a bearing starting beyond d takes the interior J10-2 (5k) for yielding', () => {
		const far = { ...web, endDistance: 1.1 * web.h, ss: 100 };
		const reading = computeAiscWebReading(far, 'lrfd', 345 * web.Wel);
		const k = web.tf + web.r;
		const j10_2 = 1.0 * web.fyw * web.tw * (5 * k + far.ss);
		expect(reading.fRd).toBeLessThanOrEqual(j10_2 * (1 + 1e-12));
		expect(reading.place).toBe('through');
	});
});
