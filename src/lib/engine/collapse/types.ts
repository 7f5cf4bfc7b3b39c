/**
 * Inputs and results of the exact plastic collapse solver. Internal units throughout: mm, N,
 * N/mm, N·mm. Sign conventions: x from the left end of the beam line, downward loads positive,
 * sagging moment positive, shear V = dM/dx, reactions upward positive.
 */
import type { BeamLine, CapacitySegment, Load } from '../model/types';

/** What the solver is asked: the largest factor λ on `variableLoads` with `fixedLoads` as given. */
export interface CollapseProblem {
	beam: BeamLine;
	/** Plastic moment resistance along the beam (N·mm), piecewise constant. */
	capacity: CapacitySegment[];
	/** Loads present at their given size (not factored by λ), design values. */
	fixedLoads: Load[];
	/** Loads multiplied by λ, design values. */
	variableLoads: Load[];
}

/** A plastic hinge of the collapse mechanism. */
export interface Hinge {
	/** Position from the left end, mm. */
	x: number;
	/** Moment at the hinge at collapse, N·mm, sagging positive (±Mp). */
	moment: number;
	/** Relative hinge rotation, signed (sagging positive), scaled so the largest |rotation| is 1. */
	rotation: number;
}

/** Collapse moment and shear diagrams; a repeated x marks a jump (point load, support). */
export interface CollapseDiagram {
	/** Positions, mm, non-decreasing. */
	x: number[];
	/** Bending moment, N·mm, sagging positive. */
	M: number[];
	/** Shear force, N, V = dM/dx. */
	V: number[];
}

/** The mechanism found by the kinematic side of the certificate. */
export interface MechanismSummary {
	/** Plain language, e.g. 'beam mechanism in span 2' or 'overhang root at support B'. */
	name: string;
	/** 0-based indices into `beam.spans` of the spans that move. */
	spans: number[];
}

/** Fields shared by a solved collapse, certified or not. */
export interface CollapseSolution {
	/** Collapse load factor λ on the variable loads (dimensionless, ≥ 0). */
	loadFactor: number;
	/** λ of a statically admissible moment field checked on its exact extremes (static theorem). */
	lowerBound: number;
	/** λ from the virtual work of the mechanism, computed independently (kinematic theorem). */
	upperBound: number;
	/** (upperBound − lowerBound) / upperBound. */
	gap: number;
	hinges: Hinge[];
	mechanism: MechanismSummary;
	diagram: CollapseDiagram;
	/** Vertical reaction per node at collapse, N, upward positive; 0 at free ends. */
	reactions: number[];
	/** Largest equilibrium error of the collapse field, relative to the largest Mp and load. */
	equilibriumResidual: number;
}

/** The outcome of `solveCollapse`. Only `mechanism` with `certified: true` may count as a pass. */
export type CollapseResult =
	| ({ status: 'mechanism'; certified: boolean } & CollapseSolution)
	| ({ status: 'not-certified'; certified: false; message: string } & CollapseSolution)
	| { status: 'fails-under-fixed'; message: string; overstress: number }
	| { status: 'unbounded'; message: string };
