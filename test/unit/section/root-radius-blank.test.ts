/**
 * A measured rolled I without its root radius: read as r = 0 with a warning. r = 0 drops the four
 * root fillets, so area, second moment and plastic modulus are the smallest the other sizes
 * allow; each fillet adds (1 − π/4)r² of area (geometry of a quarter circle cut from a square).
 */
import { describe, expect, it } from 'vitest';
import { resolveSection } from '../../../src/lib/engine/section/index';
import { expectRel } from '../../support/expect-rel';

const SIZES = { h: 257.2, b: 146.1, tw: 6.1, tf: 8.6 };

function resolve(r?: number) {
	const out = resolveSection({ shape: 'I', ...SIZES, ...(r === undefined ? {} : { r }) });
	if (!out.ok) throw new Error(JSON.stringify(out.issues));
	return out;
}

describe('measured I without a root radius', () => {
	it('is read as r = 0 and says so in a warning at the radius', () => {
		const blank = resolve();
		expect(blank.value.dims).toMatchObject({ r: 0 });
		expect(blank.warnings.map((w) => `${w.path}:${w.code}`)).toEqual(['r:root-radius-assumed']);
		expect(blank.warnings[0].message).toContain('smallest section properties');
	});

	it('gives the plate-only area 2·b·tf + (h − 2tf)·tw, below the area with any radius', () => {
		const blank = resolve().value.props!;
		const { h, b, tw, tf } = SIZES;
		expectRel(blank.A, 2 * b * tf + (h - 2 * tf) * tw, 1e-9);
		const r = 7.6;
		const withR = resolve(r).value.props!;
		expectRel(withR.A - blank.A, 4 * (1 - Math.PI / 4) * r * r, 1e-9);
		expect(withR.Iy).toBeGreaterThan(blank.Iy);
		expect(withR.Wply).toBeGreaterThan(blank.Wply);
	});

	it('a radius that is given raises no warning', () => {
		expect(resolve(7.6).warnings).toEqual([]);
	});
});
