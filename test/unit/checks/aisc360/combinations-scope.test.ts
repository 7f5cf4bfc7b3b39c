/**
 * The AISC bases' combinations and scope gate.
 * Sources: ASCE 7-22 §2.3.1 (1.4D; 1.2D + 1.6L + 0.5(Lr or S or R)) and §2.4.1 (D; D + L), from
 * memory; the proposed temporary load as live load is common practice until a construction-load
 * factor (ASCE 37) is confirmed. AISC 360-22 Appendix 1.1: design by inelastic analysis is an
 * LRFD method (from memory); 1.3.2a–c hinge conditions (from memory).
 */
import { describe, expect, it } from 'vitest';
import {
	listAsceCombinations,
	resolveAsceFactors
} from '../../../../src/lib/engine/checks/aisc360/combinations';
import { decideAiscRoute } from '../../../../src/lib/engine/checks/aisc360/scope';
import { aiscAsd, aiscLrfd } from '../../../../src/lib/engine/checks/aisc360/index';
import { listLoadArrangements } from '../../../../src/lib/engine/checks/load-arrangements';
import type { ScopeInput } from '../../../../src/lib/engine/checks/basis-types';

describe('ASCE 7-22 gravity combinations', () => {
	it('LRFD: 1.4D without live or temporary load, then 1.2D + 1.6L with the temporary load at 1.6', () => {
		const f = resolveAsceFactors({ set: 'asce7-lrfd' }, 'lrfd');
		const [alone, withLive] = listAsceCombinations(f, 'lrfd');
		expect([alone.gammaGsup, alone.gammaImposed, alone.gammaTemporary]).toEqual([1.4, 0, 0]);
		expect([withLive.gammaGsup, withLive.gammaImposed, withLive.gammaTemporary]).toEqual([
			1.2, 1.6, 1.6
		]);
		expect(withLive.name).toBe('1.2D + 1.6L (ASCE 7-22 2.3.1), temporary load as live load');
	});

	it('ASD: D and D + L, every factor 1.0', () => {
		const f = resolveAsceFactors({ set: 'asce7-asd' }, 'asd');
		const c = listAsceCombinations(f, 'asd');
		expect(c.map((x) => x.name)).toEqual([
			'D (ASCE 7-22 2.4.1)',
			'D + L (ASCE 7-22 2.4.1), temporary load as live load'
		]);
		expect(c[1].gammaTemporary).toBe(1);
	});

	it('each factor is editable, and a Eurocode set name leaves the ASCE 7 values in force', () => {
		const own = resolveAsceFactors(
			{ set: 'custom', gammaGAlone: 1.3, gammaGsup: 1.25, gammaQ: 1.5, gammaT: 1.2 },
			'lrfd'
		);
		expect(own).toEqual({ set: 'custom', alone: 1.3, dead: 1.25, live: 1.5, temporary: 1.2 });
		const en = resolveAsceFactors({ set: 'en1990-6.10', gammaGsup: 1.35, gammaQ: 1.5 }, 'lrfd');
		expect(en).toMatchObject({ set: 'asce7-lrfd', dead: 1.2, live: 1.6, temporary: 1.6 });
	});

	it('dead load takes one factor (no 0.9D); 1.4D is not patterned; live load is', () => {
		const f = resolveAsceFactors({ set: 'asce7-lrfd' }, 'lrfd');
		const arrangements = listLoadArrangements({
			combinations: listAsceCombinations(f, 'lrfd'),
			spanCount: 2,
			imposedSpans: [0, 1]
		});
		// 1 for 1.4D + 2² live patterns for 1.2D + 1.6L.
		expect(arrangements).toHaveLength(5);
		expect(arrangements.every((a) => a.permanent === 'sup')).toBe(true);
		expect(arrangements.map((a) => a.name)).toContain(
			'1.2D + 1.6L (ASCE 7-22 2.3.1), temporary load as live load, live on span 2'
		);
	});

	it('the resistance multipliers are φb = 0.90 (LRFD) and 1/Ωb = 1/1.67 (ASD)', () => {
		const lrfd = aiscLrfd.resolveFactors({ set: 'asce7-lrfd' }, { hasImposed: false });
		const asd = aiscAsd.resolveFactors({ set: 'asce7-asd' }, { hasImposed: false });
		expect(lrfd.resistance).toEqual({ section: 0.9, member: 0.9 });
		expect(asd.resistance.section).toBeCloseTo(1 / 1.67, 12);
	});
});

describe('AISC scope gate', () => {
	const base: ScopeInput = {
		sectionClass: 1,
		ductile: true,
		gradeConfirmed: true,
		needsShearBucklingCheck: false,
		collapseCertified: true,
		hingesRestrained: true
	};

	it('LRFD with hinges allowed: plastic collapse under Appendix 1', () => {
		const d = decideAiscRoute(base, 'lrfd');
		expect(d.route).toBe('plastic');
		expect(d.reasons[0]).toContain('Appendix 1');
	});

	it('ASD never uses plastic collapse, and says why', () => {
		const d = decideAiscRoute(base, 'asd');
		expect(d.route).toBe('elastic-plastic-section');
		expect(d.reasons[0]).toContain('LRFD method');
	});

	it('compact but not to λpd, or hinges not braced within Lpd: the elastic route, named', () => {
		expect(decideAiscRoute({ ...base, sectionClass: 2 }, 'lrfd').reasons[0]).toContain('λpd');
		const unbraced = decideAiscRoute({ ...base, hingesRestrained: false }, 'lrfd');
		expect(unbraced.route).toBe('elastic-plastic-section');
		expect(unbraced.reasons[0]).toContain('1.3.2c');
	});

	it('noncompact: elastic with local buckling; slender, iron or an unconfirmed grade: outside', () => {
		expect(decideAiscRoute({ ...base, sectionClass: 3 }, 'lrfd').route).toBe('elastic-first-yield');
		for (const s of [
			{ ...base, sectionClass: 4 as const },
			{ ...base, ductile: false },
			{ ...base, gradeConfirmed: false }
		]) {
			expect(decideAiscRoute(s, 'lrfd').route).toBe('outside-scope');
			expect(decideAiscRoute(s, 'asd').route).toBe('outside-scope');
		}
	});
});
