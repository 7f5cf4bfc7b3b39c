/**
 * A case file in US customary units (`"units": "us"`) reads as the same case written in SI.
 * Conversion factors: NIST Special Publication 811 (2008 edition), Appendix B.8/B.9, from the
 * exact definitions 1 ft = 0.3048 m, 1 in = 0.0254 m, 1 lb = 0.453 592 37 kg and standard gravity
 * 9.806 65 m/s² (1 lbf = 4.448 221 615 260 5 N). The SI twin below is written from those factors
 * in this file, not from the engine's own table.
 */
import { describe, expect, it } from 'vitest';
import { CASE_FORMAT, CASE_VERSION, parseCase } from '../../src/lib/engine/case/index';
import { checkCase } from '../../src/lib/engine/index';

const M_PER_FT = 0.3048;
const MM_PER_IN = 25.4;
const KG_PER_LB = 0.45359237;
const G_N = 9.80665;
const KN_PER_KIP = (1000 * KG_PER_LB * G_N) / 1000; // 1 kip = 1000 lbf
const MPA_PER_KSI = (KN_PER_KIP * 1000) / MM_PER_IN ** 2;
const KN_PER_M_PER_KIP_PER_FT = KN_PER_KIP / M_PER_FT;
const KNM_PER_KIP_FT = KN_PER_KIP * M_PER_FT;
const KG_PER_M_PER_LB_PER_FT = KG_PER_LB / M_PER_FT;

/** Every converted kind of field: lengths, loads, section sizes, strengths, bearing, loss. */
function usCase(): Record<string, any> {
	return {
		format: CASE_FORMAT,
		version: CASE_VERSION,
		units: 'us',
		beam: {
			spans: [20, 12.5],
			supports: ['pin', 'pin', 'pin'],
			section: [
				{ shape: 'I', h: 12.22, b: 6.49, tw: 0.23, tf: 0.38, r: 0.3 },
				{ shape: 'welded-I', h: 12, b: 6.5, tw: 0.25, tf: 0.375 }
			],
			grade: { fy: 50, fu: 65 },
			sectionLoss: 0.01,
			restraint: { lateral: [0, 5, 10, 20, 26.25, 32.5], loadHeight: 'top-flange' },
			bearing: [4, 6, 4],
			bearingLoads: 2
		},
		loads: [
			{ kind: 'point', x: 10, value: 2, action: 'temporary' },
			{ kind: 'uniform', from: 0, to: 32.5, value: 0.4, action: 'permanent' },
			{ kind: 'linear', from: 21, to: 30, start: 0.1, end: 0.6, action: 'imposed' }
		]
	};
}

/** The same case in SI file units, from the NIST factors. */
function siCase(): Record<string, any> {
	const ft = (v: number) => v * M_PER_FT;
	const inch = (v: number) => v * MM_PER_IN;
	const us = usCase();
	return {
		format: CASE_FORMAT,
		version: CASE_VERSION,
		beam: {
			spans: [ft(20), ft(12.5)],
			supports: ['pin', 'pin', 'pin'],
			section: [
				{ shape: 'I', h: inch(12.22), b: inch(6.49), tw: inch(0.23), tf: inch(0.38), r: inch(0.3) },
				{ shape: 'welded-I', h: inch(12), b: inch(6.5), tw: inch(0.25), tf: inch(0.375) }
			],
			grade: { fy: 50 * MPA_PER_KSI, fu: 65 * MPA_PER_KSI },
			sectionLoss: inch(0.01),
			restraint: { lateral: us.beam.restraint.lateral.map(ft), loadHeight: 'top-flange' },
			bearing: [inch(4), inch(6), inch(4)],
			bearingLoads: inch(2)
		},
		loads: [
			{ kind: 'point', x: ft(10), value: 2 * KN_PER_KIP, action: 'temporary' },
			{
				kind: 'uniform',
				from: 0,
				to: ft(32.5),
				value: 0.4 * KN_PER_M_PER_KIP_PER_FT,
				action: 'permanent'
			},
			{
				kind: 'linear',
				from: ft(21),
				to: ft(30),
				start: 0.1 * KN_PER_M_PER_KIP_PER_FT,
				end: 0.6 * KN_PER_M_PER_KIP_PER_FT,
				action: 'imposed'
			}
		]
	};
}

/** Every number of a and b agrees to `rel` relative (absolute near zero); other values equal. */
function expectClose(a: unknown, b: unknown, rel: number, path = ''): void {
	if (typeof a === 'number' && typeof b === 'number') {
		const scale = Math.max(Math.abs(a), Math.abs(b), 1e-9);
		if (Math.abs(a - b) / scale > rel) expect.fail(`${path}: ${a} vs ${b}`);
		return;
	}
	if (typeof a !== 'object' || a === null || typeof b !== 'object' || b === null) {
		expect(a, path).toEqual(b);
		return;
	}
	expect(Object.keys(a).sort(), path).toEqual(Object.keys(b).sort());
	for (const key of Object.keys(a)) {
		expectClose((a as any)[key], (b as any)[key], rel, `${path}.${key}`);
	}
}

describe('a US-units case equals its SI twin (NIST SP 811 factors)', () => {
	it('the internal model agrees to 1e-9 relative', () => {
		const us = parseCase(usCase());
		const si = parseCase(siCase());
		if (!us.ok) throw new Error(JSON.stringify(us.issues));
		if (!si.ok) throw new Error(JSON.stringify(si.issues));
		expect(us.value.units).toBe('us');
		const { file: uf, fileSI: ufs, units: _u, ...usModel } = us.value;
		const { file: _sf, fileSI: sfs, units: _s, ...siModel } = si.value;
		expectClose(usModel, siModel, 1e-9);
		// The file is kept as written (US, for round trips); its SI twin matches the SI file.
		expect(uf).toMatchObject({ units: 'us', beam: { spans: [20, 12.5] } });
		const { units: _x, ...ufsRest } = ufs;
		expectClose(ufsRest, sfs, 1e-9);
	});

	it('the answer agrees to 1e-9 relative', () => {
		const us = checkCase(usCase());
		const si = checkCase(siCase());
		if (!us.ok || !si.ok) throw new Error('both cases must be valid');
		expectClose(us.report.answer.multiplier, si.report.answer.multiplier, 1e-9);
		expect(us.report.answer.verdict).toBe(si.report.answer.verdict);
	});

	it('a known Mp in kip·ft and its mass in lb/ft convert too', () => {
		const mp = (c: Record<string, any>, value: number, mass: number) => {
			c.beam.section = { mp: value, mass };
			delete c.beam.grade;
			delete c.beam.sectionLoss;
			return c;
		};
		const us = parseCase(mp(usCase(), 100, 26));
		const si = parseCase(mp(siCase(), 100 * KNM_PER_KIP_FT, 26 * KG_PER_M_PER_LB_PER_FT));
		if (!us.ok || !si.ok) throw new Error('both cases must be valid');
		expectClose(us.value.sections, si.value.sections, 1e-9);
		expectClose(us.value.selfWeightLoads, si.value.selfWeightLoads, 1e-9);
	});
});

describe('limits apply after conversion', () => {
	it('a span of 330 ft (100.6 m) is beyond the 100 m limit; 328 ft (99.97 m) is not', () => {
		const withSpan = (L: number) => {
			const c = usCase();
			c.beam.spans = [L];
			c.beam.supports = ['pin', 'pin'];
			c.beam.section = c.beam.section[0];
			c.beam.bearing = [4, 4];
			c.beam.restraint = { lateral: 'continuous' };
			c.loads = [{ kind: 'point', x: 10, value: 2, action: 'temporary' }];
			return parseCase(c);
		};
		expect(withSpan(328).ok).toBe(true);
		const r = withSpan(330);
		expect(r.ok).toBe(false);
		if (r.ok) return;
		expect(r.issues.map((i) => `${i.path}:${i.code}`)).toEqual(['beam.spans[0]:out-of-range']);
		expect(r.issues[0].message).toMatch(/330 ft/);
	});

	it('an own yield strength of 110 ksi (758 MPa) is beyond the 700 MPa limit', () => {
		const c = usCase();
		c.beam.grade = { fy: 110 };
		const r = parseCase(c);
		expect(r.ok ? [] : r.issues.map((i) => i.path)).toEqual(['beam.grade.fy']);
	});
});
