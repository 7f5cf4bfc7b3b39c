/**
 * Capacity curve P_max(x) against closed forms of simple plastic theory (B.G. Neal, "The Plastic
 * Methods of Structural Analysis"; M.R. Horne, "Plastic Theory of Structures" — method from
 * memory, closed forms derived beside each check): a point load W at a on a simple span collapses
 * at W = Mp·L/(a(L − a)), least at midspan 4Mp/L; with a fixed UDL g the midspan value is
 * 4Mp/L − gL/2; a cantilever is weakest at its tip, Mp/L.
 */
import { describe, expect, it } from 'vitest';
import { computeCapacityCurve } from '../../../src/lib/engine/collapse';
import { makeProblem, relativeError } from './builders';

const curveOf = (spec: Parameters<typeof makeProblem>[0]) => {
	const p = makeProblem(spec);
	return computeCapacityCurve({ beam: p.beam, capacity: p.capacity, fixedLoads: p.fixedLoads });
};

describe('computeCapacityCurve', () => {
	it('simple span: every point is Mp·L/(a(L − a)); minimum 4Mp/L at midspan; null at the supports', () => {
		const c = curveOf({ spans: [6], supports: ['pin', 'pin'], Mp: 100, variable: [] });
		expect(c.status).toBe('ok');
		if (c.status !== 'ok') return;
		for (const p of c.points) {
			const a = p.x / 1000;
			if (a === 0 || a === 6) expect(p.Pmax).toBeNull();
			else
				expect(relativeError(p.Pmax as number, ((100 * 6) / (a * (6 - a))) * 1000)).toBeLessThan(
					1e-9
				);
		}
		expect(relativeError(c.minimum.Pmax, ((4 * 100) / 6) * 1000)).toBeLessThan(1e-12);
		expect(Math.abs(c.minimum.x - 3000)).toBeLessThan(1e-3);
		expect(c.certified).toBe(true);
	});
	it('simple span with a fixed UDL: minimum 4Mp/L − gL/2 at midspan', () => {
		const c = curveOf({
			spans: [6],
			supports: ['pin', 'pin'],
			Mp: 100,
			fixed: [{ w: 20, from: 0, to: 6 }],
			variable: []
		});
		expect(c.status === 'ok' && relativeError(c.minimum.Pmax, (400 / 6 - 60) * 1000)).toBeLessThan(
			1e-9
		);
	});
	it('cantilever: weakest at the tip, Mp/L; overhang: Mp/c at its tip', () => {
		const c = curveOf({ spans: [4], supports: ['fixed', 'free'], Mp: 80, variable: [] });
		expect(c.status === 'ok' && c.minimum.x).toBe(4000);
		expect(c.status === 'ok' && relativeError(c.minimum.Pmax, 20_000)).toBeLessThan(1e-12);
		const o = curveOf({ spans: [6, 2], supports: ['pin', 'pin', 'free'], Mp: 100, variable: [] });
		expect(o.status === 'ok' && o.minimum.mechanism).toBe('overhang root at support B');
		expect(o.status === 'ok' && relativeError(o.minimum.Pmax, 50_000)).toBeLessThan(1e-12);
	});
	it('fixed loads that already exceed the capacity are reported, not drawn', () => {
		const c = curveOf({
			spans: [6],
			supports: ['pin', 'pin'],
			Mp: 100,
			fixed: [{ w: 30, from: 0, to: 6 }],
			variable: []
		});
		expect(c.status).toBe('fails-under-fixed');
	});
});
