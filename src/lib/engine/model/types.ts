/**
 * The beam-line model in internal units (mm, N, N/mm, N·mm). Case files and the UI convert into
 * this shape at the edge; the solvers read nothing else.
 */

/** One entry per node, left to right. `free` is allowed only at the two ends. */
export type SupportKind = 'pin' | 'fixed' | 'free';
/** Per internal node: does moment pass through the joint? */
export type JointKind = 'continuous' | 'simple';
/** Action category; decides the partial factor and whether λ scales the load. */
export type ActionCategory = 'permanent' | 'imposed' | 'temporary';

export interface PointLoad {
	kind: 'point';
	/** Position from the left end of the beam line, mm. */
	x: number;
	/** Force, N; positive acts downward. */
	value: number;
	action: ActionCategory;
}
export interface UniformLoad {
	kind: 'uniform';
	from: number;
	to: number;
	/** Line load, N/mm (= kN/m); positive acts downward. */
	value: number;
	action: ActionCategory;
}
export interface LinearLoad {
	kind: 'linear';
	from: number;
	to: number;
	/** Line load at `from` and at `to`, N/mm; positive acts downward. */
	start: number;
	end: number;
	action: ActionCategory;
}
export type Load = PointLoad | UniformLoad | LinearLoad;

/** Geometry and support conditions of a beam line. */
export interface BeamLine {
	/** Span lengths, mm, left to right. Node i sits at the sum of the first i spans. */
	spans: number[];
	/** spans.length + 1 entries. */
	supports: SupportKind[];
	/** spans.length − 1 entries, one per internal node. */
	joints: JointKind[];
}

/**
 * Bending resistance along the beam, piecewise constant. Segments cover [0, total length]
 * without gaps; where two segments meet, the weaker governs at the meeting point.
 * Magnitudes in N·mm, both positive.
 */
export interface CapacitySegment {
	from: number;
	to: number;
	/** Resistance to sagging (positive) moment. */
	sagging: number;
	/** Resistance to hogging (negative) moment, as a positive magnitude. */
	hogging: number;
}
