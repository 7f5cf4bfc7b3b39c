/**
 * The scope gate (EN 1993-1-1 5.5, 5.6, 6.2, 6.3.5, 3.2.2; clause wording from memory) and the
 * verdict rules stated in verdict.ts (the 80 % existing-load warning is common practice).
 */
import { describe, expect, it } from 'vitest';
import { decideRoute, type ScopeInput } from '../../../src/lib/engine/checks/en1993/scope';
import { decideVerdict } from '../../../src/lib/engine/checks/verdict';
import type { CheckResult } from '../../../src/lib/engine/checks/types';
import { checkDeflection } from '../../../src/lib/engine/checks/deflection';

const ok: ScopeInput = {
	sectionClass: 1,
	ductile: true,
	gradeConfirmed: true,
	needsShearBucklingCheck: false,
	collapseCertified: true,
	hingesRestrained: true
};

describe('decideRoute', () => {
	it('Class 1, ductile, restrained, certified: plastic collapse', () => {
		expect(decideRoute(ok).route).toBe('plastic');
	});

	it('Class 2: elastic analysis with the plastic resistance', () => {
		expect(decideRoute({ ...ok, sectionClass: 2 }).route).toBe('elastic-plastic-section');
	});

	it('Class 3: first yield with Wel·fy', () => {
		expect(decideRoute({ ...ok, sectionClass: 3 }).route).toBe('elastic-first-yield');
	});

	it('Class 1 with a hinge in an unrestrained segment falls back to the elastic route and says why', () => {
		const r = decideRoute({
			...ok,
			hingesRestrained: false,
			hingeRestraintNote: 'no restraint near the hinge'
		});
		expect(r.route).toBe('elastic-plastic-section');
		expect(r.reasons[0]).toContain('no restraint near the hinge');
	});

	it('puts Class 4, iron, an unconfirmed grade, a slender web and an uncertified collapse outside scope', () => {
		expect(decideRoute({ ...ok, sectionClass: 4 }).reasons[0]).toMatch(/Class 4/);
		expect(decideRoute({ ...ok, ductile: false }).reasons[0]).toMatch(/not ductile/);
		expect(decideRoute({ ...ok, gradeConfirmed: false }).reasons[0]).toMatch(/not been confirmed/);
		expect(decideRoute({ ...ok, needsShearBucklingCheck: true }).reasons[0]).toMatch(
			/shear buckling/
		);
		expect(decideRoute({ ...ok, collapseCertified: false }).route).toBe('outside-scope');
	});

	it('lists every reason at once', () => {
		expect(decideRoute({ ...ok, ductile: false, sectionClass: 4 }).reasons).toHaveLength(2);
	});
});

const row = (over: Partial<CheckResult>): CheckResult => ({
	id: 'shear',
	label: 'Shear',
	clause: 'x',
	level: 'governing',
	utilisation: 0.5,
	pass: true,
	multiplierAtCapacity: 2,
	values: {},
	...over
});

describe('decideVerdict', () => {
	const scope = decideRoute(ok);
	it('passes when every governing check passes; the governing check has the smallest multiplier', () => {
		const v = decideVerdict({
			scope,
			checks: [row({ id: 'bending', multiplierAtCapacity: 1.5, utilisation: 0.6 }), row({})],
			loadFactor: 1.5
		});
		expect(v.verdict).toBe('pass');
		expect(v.governing?.id).toBe('bending');
		expect(v.allowableMultiplier).toBe(1.5);
		expect(v.reserve).toBeCloseTo(50, 12);
	});

	it('fails when one governing check fails', () => {
		const v = decideVerdict({
			scope,
			checks: [row({ utilisation: 1.01, pass: false, multiplierAtCapacity: 0.9 })],
			loadFactor: 2
		});
		expect(v.verdict).toBe('fail');
		expect(v.reserve).toBeCloseTo(-10, 12);
	});

	it('does not fail on a warning-level check, but warns', () => {
		const v = decideVerdict({
			scope,
			checks: [
				row({}),
				row({
					id: 'deflection-temporary',
					label: 'Deflection',
					level: 'warning',
					utilisation: 1.3,
					pass: false,
					multiplierAtCapacity: 0.77
				})
			],
			loadFactor: 2
		});
		expect(v.verdict).toBe('pass');
		expect(v.allowableMultiplier).toBe(2);
		expect(v.warnings.join(' ')).toMatch(/Deflection/);
	});

	it('warns when the existing loads alone use more than 80 % (common practice)', () => {
		const v = decideVerdict({ scope, checks: [row({ utilisationExisting: 0.85 })], loadFactor: 2 });
		expect(v.warnings[0]).toMatch(/85 %/);
		expect(
			decideVerdict({ scope, checks: [row({ utilisationExisting: 0.8 })], loadFactor: 2 }).warnings
		).toEqual([]);
	});

	it('gives no verdict numbers outside scope', () => {
		const v = decideVerdict({
			scope: decideRoute({ ...ok, sectionClass: 4 }),
			checks: [],
			loadFactor: null
		});
		expect(v).toMatchObject({
			verdict: 'outside-scope',
			governing: null,
			reserve: null,
			allowableMultiplier: null
		});
	});
});

describe('checkDeflection (span/limit, common practice)', () => {
	it('compares with span/200 and a cantilever as a span of twice its length', () => {
		expect(
			checkDeflection({ deflection: 15, span: 6000, cantilever: false, limit: 200 }).utilisation
		).toBeCloseTo(0.5, 12);
		expect(
			checkDeflection({ deflection: 10, span: 2000, cantilever: true, limit: 200 }).utilisation
		).toBeCloseTo(0.5, 12);
		expect(
			checkDeflection({ deflection: 0, span: 6000, cantilever: false, limit: 200 })
				.spanOverDeflection
		).toBeNull();
	});
});
