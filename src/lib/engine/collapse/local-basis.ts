/**
 * A well-conditioned description of the self-stress space. The row echelon form of E z = f
 * balances every redundant against the first supports, so on a long beam each basis field and
 * the particular field are levers over the whole length (moments of order total load × total
 * length) that cancel to the small span moments: digits are lost and the program's rows become
 * nearly parallel. Self-stresses that live on one or two spans exist wherever the support
 * moment is redundant (a unit moment at a node, falling to zero at the neighbouring nodes), so
 * the basis is rebuilt from those, and what remains (the λ direction, the particular field and
 * any other redundant) is stripped of its part that those local fields can carry.
 */
import type { SolutionSpace } from './nullspace';
import { solveSquare } from './nullspace';
import { evaluateMoment, evaluateMomentBasis, type FieldModel } from './statics';

/** Same space, same particular solution up to a self-stress; local basis vectors first. */
export function localiseSpace(model: FieldModel, space: SolutionSpace): SolutionSpace {
	const d = space.basis.length;
	if (d === 0) return space;
	const local = listLocalSelfStresses(model).filter((v) => isSelfStress(model, v));
	const chosen = pickIndependent([...local, ...space.basis], d);
	if (chosen.length < d) return space;
	const nLocal = chosen.filter((v) => local.includes(v)).length;
	if (nLocal === 0) return space;
	const localBasis = chosen.slice(0, nLocal);
	const xs = listSamplePoints(model);
	const fieldOf = (v: number[], withLoads: boolean) =>
		xs.map(([x, side]) =>
			withLoads ? evaluateMoment(model, v, x, side) : dot(evaluateMomentBasis(model, x, side), v)
		);
	const localFields = localBasis.map((v) => fieldOf(v, false));
	const strip = (v: number[], withLoads: boolean) => {
		const y = fitLeastSquares(localFields, fieldOf(v, withLoads));
		if (!y) return v;
		const out = v.slice();
		y.forEach((c, k) => localBasis[k].forEach((b, i) => (out[i] -= c * b)));
		return out;
	};
	return {
		...space,
		particular: strip(space.particular, true),
		basis: [...localBasis, ...chosen.slice(nLocal).map((v) => strip(v, false))]
	};
}

/** Unit node moments (hats over the two spans beside a node) and unit moment jumps, as z. */
function listLocalSelfStresses(model: FieldModel): number[][] {
	const { unknowns, nodeX } = model;
	const n = nodeX.length - 1;
	const reaction = (node: number) =>
		unknowns.findIndex((u) => u.kind === 'reaction' && u.node === node);
	const out: number[][] = [];
	const make = (parts: [number, number][]) => {
		if (parts.some(([i]) => i < 0)) return;
		const v = new Array<number>(unknowns.length).fill(0);
		for (const [i, value] of parts) v[i] += value;
		out.push(v);
	};
	for (let k = 0; k <= n; k++) {
		const a = k > 0 ? 1 / (nodeX[k] - nodeX[k - 1]) : 0;
		const b = k < n ? 1 / (nodeX[k + 1] - nodeX[k]) : 0;
		const parts: [number, number][] = [];
		// M rises as 1·(x − X_{k−1})/L on the left span and falls back to 0 on the right span.
		if (k > 0) parts.push([reaction(k - 1), a]);
		else parts.push([unknowns.findIndex((u) => u.kind === 'end-moment'), 1]);
		parts.push([reaction(k), -a - b]);
		if (k < n) parts.push([reaction(k + 1), b]);
		make(parts);
	}
	unknowns.forEach((u, i) => {
		if (u.kind !== 'support-moment' || u.node >= n) return;
		const b = 1 / (nodeX[u.node + 1] - nodeX[u.node]);
		make([
			[i, 1],
			[reaction(u.node), -b],
			[reaction(u.node + 1), b]
		]);
	});
	return out;
}

function isSelfStress(model: FieldModel, v: number[]): boolean {
	let size = 0;
	for (const x of v) size += Math.abs(x);
	return model.E.every(
		(row) => Math.abs(dot(row, v)) <= 1e-12 * size * Math.max(1, ...row.map(Math.abs))
	);
}

/** The first `count` vectors of the list that are linearly independent (Gram–Schmidt). */
function pickIndependent(list: number[][], count: number): number[][] {
	const q: number[][] = [];
	const out: number[][] = [];
	for (const v of list) {
		if (out.length === count) break;
		const r = v.slice();
		for (let pass = 0; pass < 2; pass++) {
			for (const e of q) {
				const c = dot(e, r);
				for (let i = 0; i < r.length; i++) r[i] -= c * e[i];
			}
		}
		const norm = Math.sqrt(dot(r, r));
		if (norm <= 1e-9 * Math.sqrt(dot(v, v))) continue;
		q.push(r.map((x) => x / norm));
		out.push(v);
	}
	return out;
}

/** Nodes (both sides) and span midpoints: enough to pin down every local field. */
function listSamplePoints(model: FieldModel): [number, 1 | -1][] {
	const out: [number, 1 | -1][] = [];
	const { nodeX } = model;
	nodeX.forEach((x, k) => {
		out.push([x, -1], [x, 1]);
		if (k > 0) out.push([(nodeX[k - 1] + x) / 2, -1]);
	});
	return out;
}

/** y minimising Σ (target − Σ y_k f_k)² over the samples (normal equations). */
function fitLeastSquares(fields: number[][], target: number[]): number[] | null {
	const A = fields.map((f) => fields.map((g) => dot(f, g)));
	const b = fields.map((f) => dot(f, target));
	return solveSquare(A, b);
}

function dot(a: number[], b: number[]): number {
	let s = 0;
	for (let i = 0; i < a.length; i++) s += a[i] * b[i];
	return s;
}
