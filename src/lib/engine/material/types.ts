/**
 * A grade as written in a case file: a library id (`S275`, `A992`, `unknown-old`, `cast-iron`)
 * or the user's own values in N/mm².
 */
export type GradeSpec = string | { fy: number; fu?: number };

/** A steel grade resolved for one governing thickness. Strengths in N/mm². */
export interface SteelGrade {
	id: string;
	name: string;
	/** Yield strength for the thickness asked for, N/mm². */
	fy: number;
	/** Tensile strength (lower end of the standard's range), N/mm²; null when unknown. */
	fu: number | null;
	/** The standard (or guidance) the values come from. */
	standard: string;
	/** Source tag as in the engineering reference: [C: …], [M: …], [P]. */
	source: string;
	/** Whether plastic hinges may be relied on (EN 1993-1-1 3.2.2 ductility). */
	ductile: boolean;
	/** True when the value is a default the user must confirm (unknown old steel). */
	needsConfirmation: boolean;
	note?: string;
}

/** One thickness band of a grade: applies for t ≤ upTo (mm). */
export interface GradeBand {
	upTo: number;
	fy: number;
	fu: number | null;
}

/** Where a grade belongs: the design basis whose picker lists it first. */
export type GradeRegion = 'eurocode' | 'us' | 'any';

/** Product forms a grade is made in; a grade without the list is made in every form. */
export type GradeProduct = 'open' | 'rectangular-hollow' | 'round-hollow';

/** A grade row of the library. */
export interface GradeRow {
	id: string;
	name: string;
	standard: string;
	source: string;
	/** Bands in rising thickness. */
	bands: readonly GradeBand[];
	/** Bands for round hollow sections where they differ (ASTM A500 Gr B and C). */
	roundBands?: readonly GradeBand[];
	/** The basis whose picker lists it (default `any`). */
	region?: GradeRegion;
	/** Product forms the standard covers (default: all). */
	products?: readonly GradeProduct[];
	needsConfirmation?: boolean;
	note?: string;
}
