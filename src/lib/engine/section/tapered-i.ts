import type { IDims, SectionProps } from './types';
import { buildIProps } from './i-props-record';
import { computeSpandrelArea, computeSpandrelOffset, computeSpandrelOwnI } from './fillet';

/** ∫ f over [a, b] by one Simpson panel: exact for the cubics integrated here. */
function integrate(f: (y: number) => number, a: number, b: number): number {
	return ((b - a) / 6) * (f(a) + 4 * f((a + b) / 2) + f(b));
}

/**
 * Properties of a rolled I with tapered flanges (American Standard S shapes): each flange is
 * thickest at the web and thins towards the toes at `slope` (1/6 for S shapes), tf being the
 * mean thickness, found a quarter of the width in from the toe. Computed exactly for that
 * outline by integrating vertical strips (full depth over the web, two flange strips beyond),
 * plus four root fillets of radius r where the web meets the flanges (the slope of about 9°
 * under the fillet is neglected).
 * It = Σ∫t³/3 over the flanges plus the web between them (no junction term: low, so safe);
 * Iw = Iz(h − tf)²/4 as for parallel flanges; Avz by EN 1993-1-1 6.2.6(3)(a).
 * @example computeTaperedIProperties({ h: 622.3, b: 204.5, tw: 20.3, tf: 27.7, r: 16.3, slope: 1 / 6 }).A
 * // ≈ 22 760 mm² (S24x121; the AISC Shapes Database gives 35.5 in² = 22 900 mm²)
 */
export function computeTaperedIProperties(dims: IDims): SectionProps {
	const { h, b, tw, tf } = dims;
	const s = dims.slope ?? 0;
	const half = h / 2;
	const web = tw / 2;
	const edge = b / 2;
	// Flange thickness at distance y from the web centreline.
	const t = (y: number) => tf + s * (b / 4 - y);
	// Both flanges and both sides of the web: four strips of each flange integral.
	const four = (f: (y: number) => number) => 4 * integrate(f, web, edge);
	// Root fillets at the web faces, centroid yf from the flange and web faces.
	const af = computeSpandrelArea(dims.r);
	const yf = computeSpandrelOffset(dims.r);
	const iOwn = computeSpandrelOwnI(dims.r);
	const armY = half - t(web) - yf;
	const armZ = web + yf;
	const A = h * tw + four(t) + 4 * af;
	const Iy =
		(tw * h ** 3) / 12 +
		four((y) => (half ** 3 - (half - t(y)) ** 3) / 3) +
		4 * (iOwn + af * armY ** 2);
	const Wply = (tw * h * h) / 4 + four((y) => (half ** 2 - (half - t(y)) ** 2) / 2) + 4 * af * armY;
	const Iz = (h * tw ** 3) / 12 + four((y) => t(y) * y * y) + 4 * (iOwn + af * armZ ** 2);
	const Wplz = (h * tw * tw) / 4 + four((y) => t(y) * y) + 4 * af * armZ;
	const flangesIt = 4 * integrate((y) => t(y) ** 3 / 3, 0, edge);
	const It = flangesIt + ((h - 2 * t(0)) * tw ** 3) / 3;
	const Avz = Math.max(A - 2 * b * tf + (tw + 2 * dims.r) * tf, (h - 2 * tf) * tw);
	return buildIProps({ A, Iy, Iz, Wply, Wplz, It, Avz, h, b, tf, d: h - 2 * t(web) - 2 * dims.r });
}
