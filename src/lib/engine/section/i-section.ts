import type { IDims, SectionProps } from './types';
import { computeSpandrelArea, computeSpandrelOffset, computeSpandrelOwnI } from './fillet';
import { buildIProps } from './i-props-record';
import { computeTaperedIProperties } from './tapered-i';

/** Options for computeISectionProperties. */
export interface ISectionOptions {
	/** Welded plate girder: no fillets, It = Σbt³/3, Avz = hw·tw (default false: rolled). */
	welded?: boolean;
}

/**
 * Properties of a doubly symmetric I or H section from its dimensions, with four root fillets
 * (rolled) or none (welded, r = 0). Formulas of engineering reference D.0; It by the SCI
 * torsion-constant formula for rolled sections (any r ≥ 0, so It is continuous as r → 0),
 * Σbt³/3 for welded ones; Iw = Iz(h − tf)²/4.
 * Avz by EN 1993-1-1 6.2.6(3)(a) for rolled and (d) for welded sections, with η = 1.0
 * (UK National Annex; conservative against the recommended 1.2).
 * @param dims h, b, tw, tf, r in mm (r ignored when welded)
 * @returns A mm², mass kg/m, Iy, Iz, It mm⁴, Wel, Wpl mm³, Iw mm⁶, iy, iz, d mm, Avz mm²
 * @example
 * computeISectionProperties({ h: 303.4, b: 165, tw: 6, tf: 10.2, r: 8.9 }).Wply
 * // ≈ 623.1e3 mm³ (305x165x40 UB)
 */
export function computeISectionProperties(
	dims: IDims,
	options: ISectionOptions = {}
): SectionProps {
	const welded = options.welded ?? false;
	// S shapes: tapered flanges need their own outline (a parallel flange overstates Iz by ~20 %).
	if (!welded && dims.slope) return computeTaperedIProperties(dims);
	const { h, b, tw, tf } = dims;
	const r = welded ? 0 : dims.r;
	const hw = h - 2 * tf;
	const af = computeSpandrelArea(r);
	const yf = computeSpandrelOffset(r);
	const iOwn = computeSpandrelOwnI(r);
	const A = 2 * b * tf + hw * tw + 4 * af;
	const Iy =
		2 * ((b * tf ** 3) / 12 + b * tf * ((h - tf) / 2) ** 2) +
		(tw * hw ** 3) / 12 +
		4 * (iOwn + af * (hw / 2 - yf) ** 2);
	const Iz = (2 * tf * b ** 3) / 12 + (hw * tw ** 3) / 12 + 4 * (iOwn + af * (tw / 2 + yf) ** 2);
	const Wply = b * tf * (h - tf) + (tw * hw * hw) / 4 + 4 * af * (hw / 2 - yf);
	const Wplz = (tf * b * b) / 2 + (hw * tw * tw) / 4 + 4 * af * (tw / 2 + yf);
	const It = welded ? (2 * b * tf ** 3 + hw * tw ** 3) / 3 : computeRolledTorsionConstant(dims);
	const Avz = welded ? hw * tw : Math.max(A - 2 * b * tf + (tw + 2 * r) * tf, hw * tw);
	return buildIProps({ A, Iy, Iz, Wply, Wplz, It, Avz, h, b, tf, d: h - 2 * tf - 2 * r });
}

/**
 * St Venant torsion constant of a rolled I-section with root fillets, mm⁴, by the SCI formula
 * (engineering reference D.0): (2/3)b·tf³ + (1/3)(h − 2tf)tw³ + 2α₁D₁⁴ − 0.420tf⁴.
 */
export function computeRolledTorsionConstant(dims: IDims): number {
	const { h, b, tw, tf, r } = dims;
	const alpha =
		-0.042 +
		(0.2204 * tw) / tf +
		(0.1355 * r) / tf -
		(0.0865 * r * tw) / tf ** 2 -
		(0.0725 * tw ** 2) / tf ** 2;
	const D1 = ((tf + r) ** 2 + (r + 0.25 * tw) * tw) / (2 * r + tf);
	const plates = (2 / 3) * b * tf ** 3 + (1 / 3) * (h - 2 * tf) * tw ** 3;
	return plates + 2 * alpha * D1 ** 4 - 0.42 * tf ** 4;
}
