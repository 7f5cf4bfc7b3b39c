/**
 * Limits of a case file, in the file's own units: list sizes, text lengths and the plausible range
 * of every number. They keep the solvers to real beams and loads (src/lib/engine/README.md,
 * "Limits", gives the reason for each) and keep every product of inputs finite.
 */

/** An inclusive range [min, max] of a number in file units. */
export type Range = readonly [number, number];

/** Sizes of lists and texts, and how deep and large the JSON of a case may be. */
export const SIZE_LIMITS = {
	spans: 50,
	loads: 200,
	restraints: 100,
	title: 200,
	place: 200,
	label: 80,
	designation: 80,
	gradeName: 40,
	/** Deepest nesting of objects and lists (a valid case needs 4). */
	depth: 12,
	/** Values in the whole JSON tree (a full-size valid case needs about 3 000). */
	values: 20_000,
	/** Characters of an unknown key quoted back in a warning. */
	keyShown: 40
} as const;

/** Plausible ranges of the numbers of a case file (file units). */
export const RANGES = {
	/** Span, m. */
	span: [0.1, 100],
	/** Size of a non-zero point load, kN. */
	pointLoad: [1e-3, 10_000],
	/** Size of a non-zero line load, kN/m. */
	lineLoad: [1e-3, 1_000],
	/** Known plastic moment, kNm. */
	mp: [0.01, 100_000],
	/** Mass per metre, kg/m. */
	mass: [0, 5_000],
	/** Yield strength, MPa. */
	fy: [100, 700],
	/** Tensile strength, MPa. */
	fu: [100, 1_000],
	/** Section dimension (depth, width, thickness, diameter), mm. */
	dimension: [1, 5_000],
	/** Root radius of a measured I section, mm. */
	radius: [0, 200],
	/** Section loss per exposed face, mm. */
	sectionLoss: [0, 50],
	/** Partial factor on a load (γG,sup, γQ, γ of the temporary load). */
	loadFactor: [0.5, 3],
	/** γG,inf: permanent load where favourable. */
	favourableFactor: [0, 1.5],
	/** γM0, γM1. */
	materialFactor: [0.8, 2],
	/** ξ of EN 1990 6.10b. */
	xi: [0.5, 1],
	/** ψ0 combination values. */
	psi: [0, 1],
	/** Deflection limit as span divided by n. */
	deflectionRatio: [20, 2_000],
	/** η of EN 1993-1-5 5.1. */
	eta: [1, 1.2],
	/** Stiff bearing length, mm. */
	bearing: [0, 2_000]
} as const satisfies Record<string, Range>;
