/**
 * Bad inputs come back as issues naming the field, never as a verdict: the design checks only
 * ever see a validated case. Invented values.
 */
import { describe, expect, it } from 'vitest';
import { checkCase } from '../../../src/lib/engine/index';

const good = () => ({
	format: 'hingepoint.case',
	version: 1,
	beam: {
		spans: [6],
		supports: ['pin', 'pin'],
		section: { designation: 'UB 305x165x40' },
		grade: 'S275' as unknown
	} as Record<string, unknown>,
	loads: [{ kind: 'point', x: 3, value: 10, action: 'temporary' }] as Record<string, unknown>[],
	factors: {} as Record<string, unknown>
});

function issuesOf(json: unknown): string[] {
	const out = checkCase(json);
	expect(out.ok).toBe(false);
	expect(out).not.toHaveProperty('report');
	return out.ok ? [] : out.issues.map((i) => i.path);
}

describe('bad inputs name their field and give no verdict', () => {
	it('the good case gives a verdict (control)', () => {
		const out = checkCase(good());
		expect(out.ok && out.report.answer.verdict).toBe('pass');
	});

	it('negative span', () => {
		const c = good();
		c.beam.spans = [-6];
		expect(issuesOf(c)).toContain('beam.spans[0]');
	});

	it('load off the beam', () => {
		const c = good();
		c.loads[0].x = 7;
		expect(issuesOf(c)).toContain('loads[0].x');
	});

	it('support list of the wrong length', () => {
		const c = good();
		c.beam.supports = ['pin', 'pin', 'pin'];
		expect(issuesOf(c)).toContain('beam.supports');
	});

	it('fy of zero', () => {
		const c = good();
		c.beam.grade = { fy: 0 };
		expect(issuesOf(c).some((p) => p.startsWith('beam.grade'))).toBe(true);
	});

	it('a cast-iron grade', () => {
		const c = good();
		c.beam.grade = 'cast-iron';
		expect(issuesOf(c)).toContain('beam.grade');
	});

	it('an unknown factor set, a bad load height, a restraint off the beam, η of zero', () => {
		const c = good();
		c.factors.set = 'en1990-6.99';
		c.beam.restraint = { lateral: [9], loadHeight: 'roof' };
		(c as Record<string, unknown>).eta = 0;
		const paths = issuesOf(c);
		expect(paths).toContain('factors.set');
		expect(paths).toContain('beam.restraint.loadHeight');
		expect(paths).toContain('beam.restraint.lateral[0]');
		expect(paths).toContain('eta');
	});

	it('bearing lengths of the wrong count', () => {
		const c = good();
		c.beam.bearing = [100];
		expect(issuesOf(c)).toContain('beam.bearing');
	});
});
