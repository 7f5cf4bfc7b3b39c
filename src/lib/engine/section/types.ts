/**
 * Section data shared by the section library, the collapse engine and the member checks.
 * All lengths in mm; property names match the case-file / CLI JSON (`props`, `dims`).
 */

export type SectionFamily = 'UB' | 'UC' | 'IPE' | 'HEA' | 'HEB' | 'W' | 'SHS' | 'RHS' | 'CHS';

/** How the cross-section is built; decides which formulas and code clauses apply. */
export type SectionShape =
	| 'I' /* rolled I or H with root fillets */
	| 'welded-I' /* welded I, no fillets */
	| 'RHS' /* hot-finished or cold-formed rectangular/square hollow */
	| 'CHS' /* circular hollow */
	| 'flat' /* solid rectangle / flat bar */
	| 'known-mp'; /* only the plastic modulus or Mp is known */

export interface IDims {
	h: number;
	b: number;
	tw: number;
	tf: number;
	/** Root radius; 0 for welded sections. */
	r: number;
}
export interface RhsDims {
	h: number;
	b: number;
	t: number;
	/** Outer and inner corner radii. */
	ro: number;
	ri: number;
}
export interface ChsDims {
	d: number;
	t: number;
}
export interface FlatDims {
	h: number;
	b: number;
}

/** Cross-section properties in mm-based units. Axis y is the major axis. */
export interface SectionProps {
	/** Area, mm². */
	A: number;
	/** Mass per metre, kg/m (ρ = 7850 kg/m³). */
	mass: number;
	/** Second moments of area, mm⁴. */
	Iy: number;
	Iz: number;
	/** Elastic and plastic section moduli, mm³. */
	Wely: number;
	Wply: number;
	Welz: number;
	Wplz: number;
	/** St Venant torsion constant, mm⁴. */
	It: number;
	/** Warping constant, mm⁶. */
	Iw: number;
	/** Radii of gyration, mm. */
	iy: number;
	iz: number;
	/** Shear area for load parallel to the web / depth (EN 1993-1-1 6.2.6(3)), mm². */
	Avz: number;
	/** Depth between fillets (I) or flat web depth (hollow), mm; 0 where not meaningful. */
	d: number;
}
