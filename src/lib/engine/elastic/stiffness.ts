/**
 * Assembly and solution of the stiffness equations of a beam line: one element per span, one
 * deflection per node, one rotation per node except at a simple joint, where each side has its
 * own rotation (the joint passes shear but no moment).
 */
import type { BeamLine } from '../model/types';
import type { ElementLoad } from './element-loads';
import { computeElementStiffness, computeFixedEndForces } from './fixed-end';
import { solveLinearSystem } from './linear-solve';

/** Nodal displacements and element end forces of a solved beam line. */
export interface StiffnessSolution {
	/** Per element: [v1 (mm, up), θ1 (rad, anticlockwise), v2, θ2]. */
	endDisplacements: number[][];
	/** Per element: [F1 (N, up), M1 (N·mm, anticlockwise), F2, M2] applied to the element. */
	endForces: number[][];
	/** Per element, the DOF numbers of [v1, θ1, v2, θ2]. */
	dofs: number[][];
	/** DOF numbers held by a support. */
	restrained: Set<number>;
}

/** Numbers the DOFs: v of node i is i; rotations follow, two at a simple joint. */
function numberDofs(beam: BeamLine): { dofs: number[][]; restrained: Set<number>; count: number } {
	const n = beam.spans.length;
	let next = n + 1;
	const rotLeftEnd: number[] = []; // rotation DOF of element e at its left end
	const rotRightEnd: number[] = [];
	let shared = next++;
	for (let e = 0; e < n; e++) {
		rotLeftEnd.push(shared);
		const simple = e < n - 1 && beam.joints[e] === 'simple';
		rotRightEnd.push(simple ? next++ : next);
		shared = simple ? next++ : next++;
	}
	const dofs = beam.spans.map((_, e) => [e, rotLeftEnd[e], e + 1, rotRightEnd[e]]);
	const restrained = new Set<number>();
	beam.supports.forEach((kind, i) => {
		if (kind === 'free') return;
		restrained.add(i);
		if (kind !== 'fixed') return;
		if (i > 0) restrained.add(rotRightEnd[i - 1]);
		if (i < n) restrained.add(rotLeftEnd[i]);
	});
	return { dofs, restrained, count: next };
}

/**
 * Solves the beam line under element loads. Returns null if the stiffness matrix is singular
 * (a mechanism; callers check `findMechanismIssues` first).
 */
export function solveStiffness(
	beam: BeamLine,
	EI: number[],
	elementLoads: ElementLoad[][]
): StiffnessSolution | null {
	const { dofs, restrained, count } = numberDofs(beam);
	const K = Array.from({ length: count }, () => new Array<number>(count).fill(0));
	const F = new Array<number>(count).fill(0);
	const fixedEnd = beam.spans.map((L, e) => computeFixedEndForces(L, elementLoads[e]));
	const ks = beam.spans.map((L, e) => computeElementStiffness(L, EI[e]));
	beam.spans.forEach((_, e) => {
		dofs[e].forEach((p, i) => {
			F[p] -= fixedEnd[e][i];
			dofs[e].forEach((q, j) => (K[p][q] += ks[e][i][j]));
		});
	});
	const free = [...Array(count).keys()].filter((d) => !restrained.has(d));
	const x = solveLinearSystem(
		free.map((p) => free.map((q) => K[p][q])),
		free.map((p) => F[p])
	);
	if (!x) return null;
	const d = new Array<number>(count).fill(0);
	free.forEach((p, i) => (d[p] = x[i]));
	const endDisplacements = dofs.map((ids) => ids.map((p) => d[p]));
	// f = k·d + fixed-end forces, per element.
	const endForces = beam.spans.map((_, e) =>
		fixedEnd[e].map(
			(f, i) => f + ks[e][i].reduce((s, kij, j) => s + kij * endDisplacements[e][j], 0)
		)
	);
	return { endDisplacements, endForces, dofs, restrained };
}
