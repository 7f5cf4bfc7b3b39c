/**
 * The kinematic side on its own: displacement fields of textbook mechanisms and the external work
 * of loads through them (virtual work; B.G. Neal, "The Plastic Methods of Structural Analysis",
 * from memory). Simple span L with a sagging hinge θ at a: δ(a) = θ·a·b/L; a UDL w does work
 * w·L·δ(a)/2. Propped cantilever (fixed at 0) with hinges at 0 and a: the span is one rigid piece
 * turning about the pin, so δ(a) = θ₀·a for the hinge rotation θ₀ at the root.
 */
import { describe, expect, it } from 'vitest';
import {
	buildDisplacement,
	computeExternalWork,
	evaluateDisplacement
} from '../../../src/lib/engine/collapse/virtual-work';
import { combineLowerBound } from '../../../src/lib/engine/collapse/certify';

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

describe('mechanism displacement and work', () => {
	it('simple span, one hinge: δ(a) = θ·a·b/L and UDL work w·L·δ(a)/2', () => {
		const [L, a, theta, w] = [6000, 2000, 0.01, 12];
		const d = buildDisplacement({ spans: [L], supports: ['pin', 'pin'], joints: [] }, [
			{ x: a, side: -1, rotation: theta }
		]);
		expect(d.compatibilityError).toBeLessThan(1e-12);
		expect(rel(evaluateDisplacement(d, a), (theta * a * (L - a)) / L)).toBeLessThan(1e-12);
		const work = computeExternalWork(d, [
			{ kind: 'uniform', from: 0, to: L, value: w, action: 'imposed' }
		]);
		expect(rel(work, (w * L * evaluateDisplacement(d, a)) / 2)).toBeLessThan(1e-12);
	});
	it('propped cantilever: the span turns about the pin, δ(a) = θ₀·a', () => {
		// Hinges at 0 (hogging, −θ₀) and a (sagging, θ₀·L/(L − a)): δ(a) = θ₀·a.
		const [L, a, t0] = [6000, 3514.7, 0.002];
		const d = buildDisplacement({ spans: [L], supports: ['fixed', 'pin'], joints: [] }, [
			{ x: 0, side: -1, rotation: -t0 },
			{ x: a, side: -1, rotation: (t0 * L) / (L - a) }
		]);
		expect(d.compatibilityError).toBeLessThan(1e-12);
		expect(rel(evaluateDisplacement(d, a), t0 * a)).toBeLessThan(1e-12);
	});
	it('flags rotations that do not fit the supports', () => {
		// One hinge cannot move a fixed-ended span.
		const d = buildDisplacement({ spans: [6000], supports: ['fixed', 'fixed'], joints: [] }, [
			{ x: 3000, side: -1, rotation: 0.01 }
		]);
		expect(d.compatibilityError).toBeGreaterThan(1e-6);
	});
});

describe('lower bound by blending', () => {
	it('t = (1 − a₀)/(a₁ − a₀) where field 1 exceeds Mp; λ unchanged when it does not', () => {
		// Field 1 at 1.001·Mp, field 0 at 0.5·Mp: t = 0.5/0.501 (convexity of |M| ≤ Mp).
		const lb = combineLowerBound({
			lambda1: 10,
			field1: [{ sag: 1.001, hog: 0.2 }],
			field0: [{ sag: 0.5, hog: 0.1 }]
		});
		expect(rel(lb, (10 * 0.5) / 0.501)).toBeLessThan(1e-14);
		const same = combineLowerBound({
			lambda1: 10,
			field1: [{ sag: 1, hog: 1 }],
			field0: [{ sag: 0.9, hog: 0 }]
		});
		expect(same).toBe(10);
	});
});
