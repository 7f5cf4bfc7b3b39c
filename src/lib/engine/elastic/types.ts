/**
 * Types of the elastic (stiffness-method) analysis. Internal units throughout: mm, N, N·mm, N/mm.
 * Sign conventions: loads and deflections positive downward; bending moment positive sagging;
 * shear V = dM/dx (positive just right of a pin that carries an upward reaction).
 */
import type { BeamLine, Load } from '../model/types';

/** Input of `analyseElastic`. */
export interface ElasticInput {
	beam: BeamLine;
	/** Flexural stiffness per span, N·mm² (E × Iy). */
	EI: number[];
	/** Loads in internal units; every load takes part (no factoring here). */
	loads: Load[];
}

/** Reaction at one node of the beam line. */
export interface NodeReaction {
	/** Node index, 0 at the left end. */
	node: number;
	/** Node position from the left end, mm. */
	x: number;
	/** Vertical reaction, N, upward positive; 0 at a free node. */
	force: number;
	/** Restraining moment the support applies to the beam, N·mm, anticlockwise positive. */
	moment: number;
	/** Bending moment in the beam at the node, N·mm, sagging positive (the support moment). */
	beamMoment: number;
}

/** State of the beam at one position. */
export interface ElasticState {
	/** Position from the left end, mm. */
	x: number;
	/** Shear force, N. */
	V: number;
	/** Bending moment, N·mm, sagging positive. */
	M: number;
	/** Deflection, mm, downward positive. */
	w: number;
	/** Slope dw/dx of the downward deflection, rad. */
	slope: number;
}

/** One point of a sampled diagram; jumps appear as two points at the same x. */
export interface ElasticDiagramPoint {
	x: number;
	V: number;
	M: number;
	w: number;
}

/** A located extreme value. */
export interface LocatedValue {
	x: number;
	value: number;
}

/** Which side of a position to read where a point load or a node makes a jump. */
export type Side = 'left' | 'right';

/** Result of an elastic analysis (plain data plus the `at` reader). */
export interface ElasticResult {
	reactions: NodeReaction[];
	/** Exact state at x (mm); `side` picks the limit at a jump (default right). */
	at(x: number, side?: Side): ElasticState;
	/** Sampled diagram, left to right, both sides of every jump. */
	diagram: ElasticDiagramPoint[];
	/** Largest sagging (value ≥ 0) and hogging (value ≤ 0) moment, N·mm; null where none. */
	maxMoment: { maxSagging: LocatedValue | null; maxHogging: LocatedValue | null };
	/** Largest deflection magnitude per span and overall, mm, signed (downward positive). */
	maxDeflection: { spans: LocatedValue[]; overall: LocatedValue };
}
