/**
 * End-to-end worked example through the public `checkCase`: an existing 305x165x40 UB in S275,
 * simply supported over 6.0 m, gk = 4.0 kN/m including self weight, a proposed temporary point
 * load at midspan. Every intermediate value is computed here from its source:
 * - section: BS 4-1:2005 dimensions (properties computed by the section library; tabulated
 *   Wpl 623 cm³, I 8500 cm⁴ in SCI P363, from memory);
 * - fy 275 N/mm² for tf ≤ 16 mm (EN 10025-2 Table 7); Class 1 (EN 1993-1-1 Table 5.2);
 * - collapse: midspan hinge, γT·Qk·L/4 + γG·gk·L²/8 = Mp,Rd (B.G. Neal, The Plastic Methods of
 *   Structural Analysis, from memory); factors of EN 1990 Table A1.2(B) (6.10; 6.10a/b with
 *   ξ = 0.85): Qk,max 65.34 kN (6.10, and 6.10a/b with ψ0 = 1.0 for a construction load) and
 *   66.96 kN (6.10a/b with ψ0 = 0.7);
 * - shear: Av and Vpl,Rd of EN 1993-1-1 6.2.6 (eq. 6.18), VEd = reaction (statics);
 * - deflection: 5gL⁴/384EI + QL³/48EI (Roark, Table 8.1, from memory);
 * - unrestrained over 6 m (EN 1993-1-1 6.3.2.3, curve b): with C1 = 1 (uniform moment,
 *   conservative) Mb,Rd = 87.04 kNm gives Qk,max = 27.88 kN; with C1 = 1.127 (UDL value) 31.04 kN
 *   and with C1 = 1.348 (point-load value, NCCI SN003a, from memory) 35.75 kN. The engine's Mcr
 *   is computed for the actual mixed diagram, so its answer must lie between the last two;
 * - bending and shear (EN 1993-1-1 6.2.8, eq. 6.30) at the hinges of a short fixed-ended beam,
 *   whose collapse load is W = 8Mp/L (Neal, from memory) with Mp replaced by My,V,Rd.
 */
import { describe, expect, it } from 'vitest';
import { checkCase } from '../../src/lib/engine/index';
import { expectRel } from '../support/expect-rel';

const caseFile = (
	extra: Record<string, unknown> = {},
	beam: Record<string, unknown> = {},
	q = 10
) => ({
	format: 'hingepoint.case',
	version: 1,
	title: 'Worked example (invented site)',
	beam: {
		spans: [6],
		supports: ['pin', 'pin'],
		section: { designation: 'UB 305x165x40' },
		grade: 'S275',
		selfWeight: false,
		restraint: { lateral: 'continuous' },
		...beam
	},
	loads: [
		{ kind: 'uniform', from: 0, to: 6, value: 4, action: 'permanent' },
		{ kind: 'point', x: 3, value: q, action: 'temporary', label: 'hoist' }
	],
	...extra
});

function run(json: unknown) {
	const out = checkCase(json, { date: '1 Dec 2026' });
	if (!out.ok) throw new Error(out.issues.map((i) => `${i.path}: ${i.message}`).join('; '));
	return out.report;
}

describe('restrained: plastic collapse with EN 1990 factors', () => {
	it('6.10: Qk,max = (4Mp,Rd/L − 1.35·gk·L/2)/1.5 ≈ 65.34 kN', () => {
		const r = run(caseFile());
		const mpRd = r.collapse!.resistance[0].sagging; // kNm
		expectRel(mpRd, (623e3 * 275) / 1e6, 1e-3); // Wpl·fy/γM0
		const qk = ((4 * mpRd) / 6 - (1.35 * 4 * 6) / 2) / 1.5;
		expectRel(qk, 65.34, 1e-3);
		expect(r.answer.verdict).toBe('pass');
		expect(r.design.route.route).toBe('plastic');
		expect(r.answer.governing?.id).toBe('bending');
		expectRel(r.answer.allowable[0].value!, qk, 1e-6);
		expectRel(r.answer.reserve!, qk / 10 - 1, 1e-6);
	});

	it('6.10a/b: the worse expression governs — 6.10a with ψ0,T = 1.0, 6.10b (66.96 kN) with ψ0,T = 0.7', () => {
		// EN 1990 6.10a: γG·Gk + γQ·ψ0·Qk; 6.10b: ξ·γG·Gk + γQ·Qk. With ψ0 = 1.0 for a construction
		// load (EN 1991-1-6 Annex A1, recommended value, from memory) 6.10a is 6.10 and governs.
		const mp = (r: ReturnType<typeof run>) => r.collapse!.resistance[0].sagging;
		const full = run(caseFile({ factors: { set: 'en1990-6.10ab' } }));
		const qkA = ((4 * mp(full)) / 6 - (1.35 * 4 * 6) / 2) / 1.5;
		expectRel(full.answer.allowable[0].value!, qkA, 1e-6);
		expect(full.design.governingArrangement).toMatch(/^6\.10a/);
		const r = run(caseFile({ factors: { set: 'en1990-6.10ab', psi0Temporary: 0.7 } }));
		const qk = ((4 * mp(r)) / 6 - (0.85 * 1.35 * 4 * 6) / 2) / 1.5;
		expectRel(qk, 66.96, 1e-3);
		expectRel(r.answer.allowable[0].value!, qk, 1e-6);
		expect(r.design.governingArrangement).toMatch(/^6\.10b/);
	});

	it('shear at Qk = 65.34 kN: VEd = 1.35·gk·L/2 + 1.5·Qk/2 = 65.21 kN, Vpl,Rd ≈ 318.6 kN, no interaction', () => {
		const r = run(caseFile({}, {}, 65.34));
		const shear = r.checks.find((c) => c.id === 'shear')!;
		// Read a hair (1e-7·L) inside the span, hence 1e-6 rather than round-off.
		expectRel(shear.vEd as number, (1.35 * 4 * 6) / 2 + (1.5 * 65.34) / 2, 1e-6);
		expectRel(shear.vRd as number, 318.6, 2e-3);
		expect(shear.utilisation).toBeLessThan(0.5);
		expect(r.answer.verdict).toBe('pass');
		expect(r.checks.find((c) => c.id === 'bending')!.utilisation).toBeLessThanOrEqual(1);
	});

	it('deflection: gk 3.78 mm + Qk 16.47 mm at Qk = 65.34 kN (span/296 overall)', () => {
		const r = run(caseFile({}, {}, 65.34));
		const I = r.sections[0].props!.Iy;
		const E = 210_000;
		const dG = (5 * 4 * 6000 ** 4) / (384 * E * I);
		const dQ = (65.34e3 * 6000 ** 3) / (48 * E * I);
		expectRel(dG, 3.78, 2e-3);
		expectRel(dQ, 16.47, 2e-3);
		const temp = r.checks.find((c) => c.id === 'deflection-temporary')!;
		const total = r.checks.find((c) => c.id === 'deflection-total')!;
		expectRel(temp.deflection as number, dQ, 1e-6);
		expectRel(total.deflection as number, dG + dQ, 1e-6);
		expect(temp.level).toBe('warning');
	});

	it('the short summary carries the date, the verdict and the notice, as plain text under 600 characters', () => {
		const r = run(caseFile({ place: 'Demo yard' }));
		expect(r.summary.short.length).toBeLessThan(600);
		expect(r.summary.short).toMatch(/1 Dec 2026/);
		expect(r.summary.short).toMatch(/PASS/);
		expect(r.summary.short).toContain(r.notices[0]);
		expect(r.summary.short).not.toMatch(/[*_`#~>[\]]/);
	});
});

describe('unrestrained over the span (lateral restraint at the supports only)', () => {
	it('uses the elastic route with Mb,Rd; Qk,max lies between the C1 = 1.127 and 1.348 values', () => {
		const r = run(
			caseFile({}, { restraint: { lateral: 'ends-only', loadHeight: 'shear-centre' } })
		);
		expect(r.design.route.route).toBe('elastic-plastic-section');
		expect(r.answer.governing?.id).toBe('ltb');
		const qk = r.answer.allowable[0].value!;
		// Qk,max from Mb,Rd (6.3.2.3, curve b) with Mcr = C1·Mcr(uniform), computed here.
		const p = r.sections[0].props!;
		const [E, G, L] = [210_000, 81_000, 6000];
		const mcr0 =
			(Math.PI / L) *
			Math.sqrt(E * p.Iz * G * p.It) *
			Math.sqrt(1 + (Math.PI ** 2 * E * p.Iw) / (L * L * G * p.It));
		const qkFor = (c1: number) => {
			const l = Math.sqrt((p.Wply * 275) / (c1 * mcr0));
			const phi = 0.5 * (1 + 0.34 * (l - 0.4) + 0.75 * l * l);
			const chi = Math.min(1, 1 / (l * l), 1 / (phi + Math.sqrt(phi * phi - 0.75 * l * l)));
			const mbRd = chi * p.Wply * 275; // N·mm
			return (mbRd - (1.35 * 4 * L * L) / 8) / ((1.5 * L) / 4) / 1000; // kN
		};
		expectRel(qkFor(1), 27.88, 2e-3); // C1 = 1: Mb,Rd 87.04 kNm
		expect(qk).toBeGreaterThan(qkFor(1.127)); // the UDL value is conservative for this mix
		expect(qk).toBeLessThan(qkFor(1.348)); // the point-load value is not
		const ltb = r.checks.find((c) => c.id === 'ltb')!;
		const Wfy = (r.sections[0].props!.Wply * 275) / 1e6; // kNm
		const lambdaBar = Math.sqrt(Wfy / (ltb.mcr as number));
		expectRel(ltb.lambdaLT as number, lambdaBar, 1e-9);
		expectRel(ltb.mbRd as number, (ltb.chiLT as number) * Wfy, 1e-9);
		// 6.3.2.3 is used (rolled I, curve b); 6.3.2.2 (curve a, α = 0.21) is reported beside it.
		const phi = 0.5 * (1 + 0.21 * (lambdaBar - 0.2) + lambdaBar ** 2);
		expectRel(ltb.chiLTGeneral as number, 1 / (phi + Math.sqrt(phi ** 2 - lambdaBar ** 2)), 1e-9);
		expect(ltb.clause).toBe('EN 1993-1-1 6.3.2.3');
	});

	it('a top-flange load allows less than a load at the shear centre, a bottom-flange load more', () => {
		const at = (loadHeight: string) =>
			run(caseFile({}, { restraint: { lateral: 'ends-only', loadHeight } })).answer.allowable[0]
				.value!;
		expect(at('top-flange')).toBeLessThan(at('shear-centre'));
		expect(at('bottom-flange')).toBeGreaterThan(at('shear-centre'));
	});
});

describe('bending with shear at the hinges (EN 1993-1-1 6.2.8)', () => {
	it('fixed-ended 3.5 m span, central load: W = 8·My,V,Rd(W/2)/L at the fixed point', () => {
		const r = run({
			...caseFile({ factors: { temporary: 1 } }, { spans: [3.5], supports: ['fixed', 'fixed'] }),
			loads: [{ kind: 'point', x: 1.75, value: 100, action: 'temporary' }]
		});
		const props = r.sections[0].props!;
		const dims = r.sections[0].dims as { h: number; tf: number; tw: number };
		const Aw = (dims.h - 2 * dims.tf) * dims.tw;
		const vpl = (r.checks.find((c) => c.id === 'shear')!.vRd as number) * 1e3; // N
		const myV = (v: number) => {
			const rho = v > 0.5 * vpl ? ((2 * v) / vpl - 1) ** 2 : 0;
			return (props.Wply - (rho * Aw * Aw) / (4 * dims.tw)) * 275;
		};
		// Solve W = 8·My,V,Rd(W/2)/L by fixed-point iteration (N, mm).
		let W = (8 * props.Wply * 275) / 3500;
		for (let k = 0; k < 200; k++) W = (8 * myV(W / 2)) / 3500;
		expect(W / 2).toBeGreaterThan(0.5 * vpl); // the reduction is active
		expectRel(r.collapse!.loadFactor! * 100e3, W, 1e-6);
		expect(r.collapse!.loadFactor!).toBeLessThan((8 * props.Wply * 275) / 3500 / 100e3);
		// The bending row reports the same shear-reduced factor; the answer is never above it.
		expect(r.checks.find((c) => c.id === 'bending')!.multiplier).toBe(r.collapse!.loadFactor);
		expect(r.answer.multiplier!).toBeLessThanOrEqual(r.collapse!.loadFactor!);
	});

	it('fixed-ended 5 m span, UDL: w = 8(My,V,Rd(wL/2) + Mpl,Rd)/L², and the answer is that bending factor', () => {
		// End hinges carry the full end shear wL/2 (between 0.5 and 1.0 Vpl,Rd here); the midspan
		// hinge carries none. Stiff bearings of 250 mm keep the supports out of the answer.
		const r = run({
			...caseFile(
				{ factors: { temporary: 1 } },
				{ spans: [5], supports: ['fixed', 'fixed'], bearing: [250, 250] }
			),
			loads: [{ kind: 'uniform', from: 0, to: 5, value: 10, action: 'temporary' }]
		});
		const props = r.sections[0].props!;
		const dims = r.sections[0].dims as { h: number; tf: number; tw: number };
		const Aw = (dims.h - 2 * dims.tf) * dims.tw;
		const vpl = (r.checks.find((c) => c.id === 'shear')!.vRd as number) * 1e3; // N
		const mp = props.Wply * 275;
		const myV = (v: number) => {
			const rho = v > 0.5 * vpl ? ((2 * v) / vpl - 1) ** 2 : 0;
			return (props.Wply - (rho * Aw * Aw) / (4 * dims.tw)) * 275;
		};
		let w = (16 * mp) / 5000 ** 2; // N/mm
		for (let k = 0; k < 200; k++) w = (8 * (myV((w * 5000) / 2) + mp)) / 5000 ** 2;
		expect((w * 5000) / 2).toBeGreaterThan(0.5 * vpl); // the reduction is active
		const bending = r.checks.find((c) => c.id === 'bending')!;
		expectRel(bending.multiplier as number, w / 10, 1e-6);
		expect(r.answer.governing?.id).toBe('bending');
		expect(r.answer.multiplier).toBe(bending.multiplier);
		expect(r.collapse!.loadFactor).toBe(bending.multiplier);
		expectRel(r.answer.allowable[0].value!, w, 1e-6); // kN/m, as entered
		expect(r.answer.allowable[0].unit).toBe('kN/m');
	});
});
