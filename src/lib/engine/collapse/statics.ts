/**
 * The statics of a beam line: every bending-moment field in equilibrium with the loads is
 *   M(x) = M_fixed(x) + Σ z_i · B_i(x)
 * where z holds the end moment at a fixed left end, the vertical reactions, the moment reactions
 * of fixed interior supports and λ, tied together by a few equilibrium equations E z = f
 * (vertical balance, zero moment at a pinned or free right end, zero moment at simple joints).
 */
import type { BeamLine, Load } from '../model/types';
import {
	computeLoadMoment,
	computeLoadResultant,
	computeLoadShear,
	type Side
} from './load-effects';

/** One unknown of the moment field. */
export type FieldUnknown =
	| { kind: 'end-moment' }
	| { kind: 'reaction'; node: number }
	| { kind: 'support-moment'; node: number }
	| { kind: 'lambda' };

/** The moment field of a beam line as a linear function of its unknowns. */
export interface FieldModel {
	beam: BeamLine;
	/** Node positions, left to right. */
	nodeX: number[];
	fixedLoads: Load[];
	variableLoads: Load[];
	unknowns: FieldUnknown[];
	/** Index of λ in z. */
	lambdaIndex: number;
	/** Equilibrium equations E z = f. */
	E: number[][];
	f: number[];
}

/** Node positions: node i at the sum of the first i spans. */
export function computeNodePositions(beam: BeamLine): number[] {
	const xs = [0];
	for (const s of beam.spans) xs.push(xs[xs.length - 1] + s);
	return xs;
}

/** Lists the unknowns of the moment field and its equilibrium equations. */
export function buildFieldModel(options: {
	beam: BeamLine;
	fixedLoads: Load[];
	variableLoads: Load[];
}): FieldModel {
	const { beam, fixedLoads, variableLoads } = options;
	const nodeX = computeNodePositions(beam);
	const n = beam.spans.length;
	const unknowns: FieldUnknown[] = [];
	if (beam.supports[0] === 'fixed') unknowns.push({ kind: 'end-moment' });
	beam.supports.forEach((s, node) => {
		if (s !== 'free') unknowns.push({ kind: 'reaction', node });
		if (s === 'fixed' && node > 0 && node < n) unknowns.push({ kind: 'support-moment', node });
	});
	unknowns.push({ kind: 'lambda' });
	const model: FieldModel = {
		beam,
		nodeX,
		fixedLoads,
		variableLoads,
		unknowns,
		lambdaIndex: unknowns.length - 1,
		E: [],
		f: []
	};
	// Vertical balance: Σ R − λ·ΣQ = ΣG.
	const vertical = unknowns.map((u) =>
		u.kind === 'reaction' ? 1 : u.kind === 'lambda' ? -computeLoadResultant(variableLoads).force : 0
	);
	model.E.push(vertical);
	model.f.push(computeLoadResultant(fixedLoads).force);
	const L = nodeX[n];
	if (beam.supports[n] !== 'fixed') addZeroMoment(model, L, -1);
	for (let k = 1; k < n; k++) {
		if (beam.joints[k - 1] !== 'simple') continue;
		addZeroMoment(model, nodeX[k], -1);
		if (beam.supports[k] === 'fixed') addZeroMoment(model, nodeX[k], 1);
	}
	return model;
}

function addZeroMoment(model: FieldModel, x: number, side: Side): void {
	model.E.push(evaluateMomentBasis(model, x, side));
	model.f.push(computeLoadMoment(model.fixedLoads, x));
}

/** Coefficient of unknown u in M(x). */
function momentCoefficient(model: FieldModel, u: FieldUnknown, x: number, side: Side): number {
	if (u.kind === 'end-moment') return 1;
	if (u.kind === 'lambda') return -computeLoadMoment(model.variableLoads, x);
	const X = model.nodeX[u.node];
	if (u.kind === 'reaction') return x > X ? x - X : 0;
	return x > X || (x === X && side > 0) ? 1 : 0;
}

/** Coefficient of unknown u in V(x). */
function shearCoefficient(model: FieldModel, u: FieldUnknown, x: number, side: Side): number {
	if (u.kind === 'lambda') return -computeLoadShear(model.variableLoads, x, side);
	if (u.kind !== 'reaction') return 0;
	const X = model.nodeX[u.node];
	return x > X || (x === X && side > 0) ? 1 : 0;
}

/** Coefficients B_i(x) of the moment field, so M(x) = M_fixed(x) + B(x)·z. */
export function evaluateMomentBasis(model: FieldModel, x: number, side: Side): number[] {
	const n = model.unknowns.length;
	const B = new Array<number>(n);
	for (let i = 0; i < n; i++) B[i] = momentCoefficient(model, model.unknowns[i], x, side);
	return B;
}

/** Coefficients of the shear field V = dM/dx, so V(x) = V_fixed(x) + S(x)·z. */
export function evaluateShearBasis(model: FieldModel, x: number, side: Side): number[] {
	const n = model.unknowns.length;
	const S = new Array<number>(n);
	for (let i = 0; i < n; i++) S[i] = shearCoefficient(model, model.unknowns[i], x, side);
	return S;
}

/** Bending moment of the field z at x, sagging positive. */
export function evaluateMoment(model: FieldModel, z: number[], x: number, side: Side): number {
	let m = -computeLoadMoment(model.fixedLoads, x);
	for (let i = 0; i < z.length; i++)
		if (z[i] !== 0) m += momentCoefficient(model, model.unknowns[i], x, side) * z[i];
	return m;
}

/** Shear of the field z at x (V = dM/dx). */
export function evaluateShear(model: FieldModel, z: number[], x: number, side: Side): number {
	let v = -computeLoadShear(model.fixedLoads, x, side);
	for (let i = 0; i < z.length; i++)
		if (z[i] !== 0) v += shearCoefficient(model, model.unknowns[i], x, side) * z[i];
	return v;
}
