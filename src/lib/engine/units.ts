/**
 * Internal units and the symbol glossary.
 *
 * Inside the engine every number is in N, mm, N·mm and N/mm² (= MPa). Case files and the UI speak
 * m, kN, kN/m and kN·m (or US customary); conversion happens only at those edges, with these helpers.
 *
 * Glossary (textbook symbols keep their textbook form in code):
 * - h, b, tw, tf, r: depth, flange width, web and flange thickness, root radius (mm)
 * - A (mm²), Iy, Iz (mm⁴), Wely, Wply (mm³), It (mm⁴), Iw (mm⁶), Avz shear area (mm²)
 * - fy, fu: yield and tensile strength (N/mm²); E, G: elastic and shear moduli (N/mm²)
 * - Mp: plastic moment (N·mm); λ (loadFactor): collapse load factor (dimensionless)
 * - γM0, γM1 (gammaM0, gammaM1): resistance partial factors; γG, γQ: action partial factors
 * - x: position along the beam line from its left end (mm); sagging moment positive
 */

/** Young's modulus of structural steel, N/mm² (EN 1993-1-1 3.2.6). */
export const E_STEEL = 210_000;
/** Shear modulus of structural steel, N/mm² (EN 1993-1-1 3.2.6, G ≈ 81 000). */
export const G_STEEL = 81_000;
/** Density of steel, kg/m³ (EN 1991-1-1 Table A.4). */
export const STEEL_DENSITY = 7850;
/** Standard gravity, m/s², to turn kg into N. */
export const GRAVITY = 9.80665;

export const mToMm = (m: number): number => m * 1000;
export const mmToM = (mm: number): number => mm / 1000;
export const kNToN = (kN: number): number => kN * 1000;
export const nToKN = (n: number): number => n / 1000;
/** kN/m equals N/mm: a line load needs no scaling, only a change of name. */
export const kNPerMToNPerMm = (w: number): number => w;
export const nPerMmToKNPerM = (w: number): number => w;
export const kNmToNmm = (m: number): number => m * 1e6;
export const nmmToKNm = (m: number): number => m / 1e6;
/** Self-weight line load (N/mm) of a member of the given mass per metre (kg/m). */
export const massToLineLoad = (kgPerM: number): number => (kgPerM * GRAVITY) / 1000;

/** US customary factors (exact from the definitions of the inch and the pound-force). */
export const US = {
	inToMm: 25.4,
	ftToM: 0.3048,
	kipToKN: 4.4482216152605,
	ksiToMPa: 6.894757293168361,
	lbPerFtToKgPerM: 1.4881639435695537
} as const;
