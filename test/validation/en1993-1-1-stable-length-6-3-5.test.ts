/**
 * EN 1993-1-1:2005 6.3.5.3, stable length of a segment next to a plastic hinge for uniform
 * rolled I sections with h/tf ≤ 40ε under linear moment (formula and limits from memory):
 * Lstable = 35·ε·iz for 0.625 ≤ ψ ≤ 1, (60 − 40ψ)·ε·iz for −1 ≤ ψ ≤ 0.625; and 6.3.5.2, a
 * restraint within h/2 of each hinge (from memory). Section 305x165x40 UB S275, iz 38.6 mm
 * (SCI P363, from memory). Closed forms are evaluated here.
 */
import { describe, expect, it } from 'vitest';
import {
	computeEndMomentRatio,
	computeStableLength
} from '../../src/lib/engine/checks/en1993/stable-length';
import { runDesignChecks } from '../../src/lib/engine/checks/run-checks';
import { resolveSection } from '../../src/lib/engine/section/index';
import { resolveGrade } from '../../src/lib/engine/material/index';

const eps = Math.sqrt(235 / 275);
const ub = { fy: 275, iz: 38.6, h: 303.4, tf: 10.2 };

describe('Lstable (6.3.5.3)', () => {
	it('35·ε·iz for ψ = 1 (≈ 1249 mm) and 60·ε·iz for ψ = 0 (≈ 2141 mm)', () => {
		expect(Math.abs(computeStableLength({ ...ub, psi: 1 })! - 35 * eps * 38.6)).toBeLessThan(1e-9);
		expect(Math.abs(computeStableLength({ ...ub, psi: 0 })! - 60 * eps * 38.6)).toBeLessThan(1e-9);
		expect(Math.round(computeStableLength({ ...ub, psi: 1 })!)).toBe(1249);
		expect(Math.round(computeStableLength({ ...ub, psi: 0 })!)).toBe(2141);
	});

	it('is continuous at ψ = 0.625 and reaches 100·ε·iz at ψ = −1', () => {
		const at = computeStableLength({ ...ub, psi: 0.625 })!;
		expect(Math.abs(at - 35 * eps * 38.6)).toBeLessThan(1e-9);
		expect(Math.abs(computeStableLength({ ...ub, psi: -1 })! - 100 * eps * 38.6)).toBeLessThan(
			1e-9
		);
	});

	it('does not apply when h/tf > 40ε', () => {
		expect(computeStableLength({ ...ub, psi: 1, tf: ub.h / (40 * eps) - 0.01 })).toBeNull();
		expect(computeStableLength({ ...ub, psi: 1, tf: ub.h / (40 * eps) + 0.01 })).not.toBeNull();
	});

	it('ψ is the smaller end moment over the larger, negative in double curvature', () => {
		expect(computeEndMomentRatio(-100, 50)).toBe(-0.5);
		expect(computeEndMomentRatio(30, 60)).toBe(0.5);
		expect(computeEndMomentRatio(0, 0)).toBe(1);
	});
});

describe('restraint at the hinge and the plastic route', () => {
	const s = resolveSection({ designation: 'UB 305x165x40' }, { loss: 0 });
	const g = s.ok ? resolveGrade('S275', s.value.governingThickness) : null;
	const input = (at: number[]) => ({
		beam: { spans: [6000], supports: ['pin' as const, 'pin' as const], joints: [] },
		sections: s.ok ? [s.value] : [],
		grades: g && g.ok ? [g.value] : [],
		loads: [{ kind: 'point' as const, x: 3000, value: 50e3, action: 'temporary' as const }],
		factors: { set: 'en1990-6.10' as const },
		restraint: { kind: 'points' as const, at },
		loadHeight: 'shear-centre' as const,
		bearing: null
	});

	it('a restraint at the midspan hinge with 3 m segments (longer than 2141 mm) is not enough', () => {
		const out = runDesignChecks(input([3000]));
		expect(out.verdict.route).toBe('elastic-plastic-section');
		expect(out.verdict.routeReasons[0]).toMatch(/stable length/);
	});

	it('restraints 1 m either side of the hinge (ψ = 2/3: 1000 mm ≤ 35·ε·iz ≈ 1249 mm) keep the plastic route', () => {
		expect(runDesignChecks(input([2000, 3000, 4000])).verdict.route).toBe('plastic');
	});

	it('restraints 2 m either side (ψ = 1/3: 2000 mm > (60 − 40/3)·ε·iz ≈ 1666 mm) do not', () => {
		const Ls = computeStableLength({ ...ub, psi: 1 / 3 })!;
		expect(Math.abs(Ls - (60 - 40 / 3) * eps * 38.6)).toBeLessThan(1e-9);
		expect(runDesignChecks(input([1000, 3000, 5000])).verdict.route).toBe(
			'elastic-plastic-section'
		);
	});
});
