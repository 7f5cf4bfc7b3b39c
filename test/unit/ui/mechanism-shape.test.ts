/**
 * The mechanism drawing's geometry against the beam mechanisms of simple plastic theory
 * (B.G. Neal, The Plastic Methods of Structural Analysis, 3rd ed., ch. 2–3: rigid pieces turning
 * at hinges, supports held; from memory). Tolerances: 1e-9 relative.
 */
import { describe, expect, it } from 'vitest';
import { computeMechanismShape } from '../../../src/lib/ui/components/drawing/mechanism-shape';

const at = (shape: { x: number; v: number }[] | null, x: number) =>
	shape?.find((p) => Math.abs(p.x - x) < 1e-9)?.v;

describe('computeMechanismShape', () => {
	it('simply supported, hinge at a: two straight pieces meeting under the hinge', () => {
		const a = 2;
		const L = 6;
		const shape = computeMechanismShape({
			spans: [L],
			supports: ['pin', 'pin'],
			joints: [],
			hinges: [a]
		});
		expect(shape?.map((p) => p.x)).toEqual([0, a, L]);
		expect(at(shape, 0)).toBe(0);
		expect(at(shape, L)).toBe(0);
		expect(at(shape, a)).toBeCloseTo(1, 12);
	});

	it('fixed at both ends with hinges at the ends and at midspan: the same kinked line', () => {
		const shape = computeMechanismShape({
			spans: [6],
			supports: ['fixed', 'fixed'],
			joints: [],
			hinges: [0, 3, 6]
		});
		expect(shape?.map((p) => p.v)).toEqual([0, 1, 0]);
	});

	it('a built-in end without a hinge cannot turn: no mechanism from one span hinge', () => {
		expect(
			computeMechanismShape({ spans: [6], supports: ['fixed', 'pin'], joints: [], hinges: [3] })
		).toBeNull();
	});

	it('cantilever: rigid rotation about the root hinge, the tip moves most', () => {
		const shape = computeMechanismShape({
			spans: [3],
			supports: ['fixed', 'free'],
			joints: [],
			hinges: [0]
		});
		expect(at(shape, 0)).toBe(0);
		expect(at(shape, 3)).toBeCloseTo(1, 12);
	});

	it('two spans, beam mechanism in span 2: span 1 does not move', () => {
		const shape = computeMechanismShape({
			spans: [6, 8],
			supports: ['pin', 'pin', 'pin'],
			joints: ['continuous'],
			hinges: [6, 10]
		});
		expect(at(shape, 0)).toBe(0);
		expect(at(shape, 6)).toBe(0);
		expect(at(shape, 10)).toBeCloseTo(1, 12);
		expect(at(shape, 14)).toBe(0);
	});

	it('overhang: hinge over the support, the back span stays, the tip drops', () => {
		const shape = computeMechanismShape({
			spans: [6, 2],
			supports: ['pin', 'pin', 'free'],
			joints: ['continuous'],
			hinges: [6]
		});
		expect(at(shape, 0)).toBe(0);
		expect(at(shape, 6)).toBe(0);
		expect(at(shape, 8)).toBeCloseTo(1, 12);
	});
});
