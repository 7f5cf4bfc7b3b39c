/**
 * Section data shared by the section library, the collapse engine and the member checks.
 * All lengths in mm; property names match the case-file / CLI JSON (`props`, `dims`).
 */

export type SectionFamily =
	| 'UB'
	| 'UC'
	| 'IPE'
	| 'HEA'
	| 'HEB'
	| 'HEM'
	| 'W'
	| 'HP' /* US bearing piles */
	| 'S' /* US American Standard beams */
	| 'HSS' /* US hollow structural sections: rectangular, square (shape RHS) and round (CHS) */
	| 'PIPE' /* US steel pipe, Std / XS / XXS */
	| 'SHS' /* hot-finished, EN 10210-2 */
	| 'RHS'
	| 'CHS'
	| 'CFSHS' /* cold-formed, EN 10219-2: designations `CF SHS …` */
	| 'CFRHS'
	| 'CFCHS';

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
	/**
	 * Flange taper of American Standard S shapes (1/6, a 16⅔ % slope); tf is then the mean
	 * flange thickness. Absent for parallel flanges.
	 */
	slope?: number;
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

/** Hot-finished (EN 10210-2) or cold-formed (EN 10219-2) hollow section; sets the corner radii. */
export type HollowProcess = 'hot' | 'cold';

/**
 * A section as written in a case file. All dimensions in mm; `mp` in kN·m, `mass` in kg/m.
 * The known-Mp form is for anything the library cannot describe by its dimensions.
 */
export type SectionSpec =
	| { designation: string }
	| { shape: 'I'; h: number; b: number; tw: number; tf: number; r?: number }
	| { shape: 'welded-I'; h: number; b: number; tw: number; tf: number }
	| { shape: 'RHS'; h: number; b: number; t: number; process?: HollowProcess }
	| { shape: 'CHS'; d: number; t: number }
	| { shape: 'flat'; h: number; b: number }
	| { mp: number; mass?: number };

/** Dimensions of any shape the library computes. */
export type SectionDims = IDims | RhsDims | ChsDims | FlatDims;

/** A standard section of the library, with its properties computed from its dimensions. */
export interface LibrarySection {
	/** Canonical designation, e.g. `UB 305x165x40`, `W12x26`, `SHS 100x100x5.0`. */
	designation: string;
	family: SectionFamily;
	/** Product standard the dimensions come from, e.g. `BS 4-1:2005 / EN 10365:2017`. */
	standard: string;
	shape: SectionShape;
	/** Dimensions, mm. */
	dims: SectionDims;
	props: SectionProps;
	/** Nominal mass from the designation or the product table, kg/m, where one is published. */
	nominalMass?: number;
	/** Material id of the family's usual grade (e.g. `A992` for W, `S355` for EN hollow). */
	defaultGrade: string;
	/**
	 * Nominal wall of a US HSS or pipe, mm, where the dims carry the design wall 0.93 × nominal
	 * (AISC 360-22 B4.2); see applyDesignWall for A1085 tubes, designed on the nominal wall.
	 */
	nominalWall?: number;
}

/** A section ready for analysis: library, measured or known-Mp, after any section loss. */
export interface ResolvedSection {
	/** Canonical designation, or a description such as `I 300x150x7.1x10.7 (measured)`. */
	designation: string;
	family?: SectionFamily;
	standard?: string;
	shape: SectionShape;
	/** Dimensions after loss, mm; null only for known-mp. */
	dims: SectionDims | null;
	/** Properties after loss; null only for known-mp. */
	props: SectionProps | null;
	/** Plastic moment given by the user, N·mm (known-mp only). */
	mpKnown?: number;
	/** Mass given by the user, kg/m (known-mp only). */
	massKnown?: number;
	/** Material id of the library family's usual grade; absent for measured and known-Mp sections. */
	defaultGrade?: string;
	/** Nominal wall of a US HSS or pipe from the table, mm (dims carry the design wall). */
	nominalWall?: number;
	/**
	 * Design wall of a US HSS or pipe before any loss, mm (AISC 360-22 B4.2): 0.93 × nominal for
	 * ERW tubes (A500, A53), the nominal wall for A1085.
	 */
	designWall?: number;
	/** Uniform thickness loss applied per exposed face, mm. */
	loss: number;
	/** Thickness that sets the grade's strength step (flange for rolled I), mm; 0 for known-mp. */
	governingThickness: number;
}
