/**
 * Load factor on the variable loads at which the elastic moment first reaches a limit somewhere
 * (first yield: Wel·fy/γM0; first hinge: Mp), with the fixed loads held at their values.
 */
import type { InputIssue } from '../model/issue';
import { assertFinite } from '../model/issue';
import type { BeamLine, Load } from '../model/types';
import { analyseElastic } from './analyse';
import { computeNodePositions, splitLoadsBySpan, type ElementLoad } from './element-loads';
import { listBreakpoints } from './element-field';
import { listMomentCandidates } from './extremes';
import type { ElasticResult, Side } from './types';

/** Input of the elastic limit factors. */
export interface ElasticLimitInput {
	beam: BeamLine;
	/** Flexural stiffness per span, N·mm². */
	EI: number[];
	/** Loads held at their (design) values. */
	fixedLoads: Load[];
	/** Loads multiplied by the factor. */
	variableLoads: Load[];
	/** Moment limit per span, N·mm (same for sagging and hogging). */
	limit: number[];
}

/** Outcome: the factor and where the limit is reached, or why there is none. */
export type ElasticLimitResult =
	| { status: 'reached'; factor: number; x: number }
	| { status: 'fails-under-fixed'; x: number; ratio: number }
	| { status: 'never'; message: string }
	| { status: 'mechanism'; issues: InputIssue[] };

/** Largest factor tried before the variable loads are called moment-free. */
const FACTOR_CEILING = 1e9;

/**
 * Factor λ on the variable loads at which max |M_fixed + λ·M_variable| / limit first reaches 1.
 * That ratio is convex in λ (a maximum of |affine| functions), so bisection on λ is exact to
 * round-off; each evaluation finds the true maximum through the shear zeros.
 */
export function computeElasticLimitFactor(input: ElasticLimitInput): ElasticLimitResult {
	const { beam, EI } = input;
	const fixed = analyseElastic({ beam, EI, loads: input.fixedLoads });
	const variable = analyseElastic({ beam, EI, loads: input.variableLoads });
	if (!fixed.ok) return { status: 'mechanism', issues: fixed.issues };
	if (!variable.ok) return { status: 'mechanism', issues: variable.issues };
	const nodes = computeNodePositions(beam);
	const fixedBp = splitLoadsBySpan(beam, input.fixedLoads);
	const varBp = splitLoadsBySpan(beam, input.variableLoads);
	const breakpoints = beam.spans.map((L, e) => {
		const points = (loads: ElementLoad[]) =>
			listBreakpoints({ L, EI: 1, loads, displacements: [], forces: [] });
		return [...new Set([...points(fixedBp[e]), ...points(varBp[e])])].sort((a, b) => a - b);
	});
	const ratioAt = (lambda: number): { ratio: number; x: number } =>
		findWorstRatio(fixed.value, variable.value, lambda, { nodes, breakpoints, limit: input.limit });
	const start = ratioAt(0);
	if (start.ratio > 1) return { status: 'fails-under-fixed', x: start.x, ratio: start.ratio };
	let hi = 1;
	while (ratioAt(hi).ratio <= 1) {
		hi *= 2;
		if (hi > FACTOR_CEILING)
			return { status: 'never', message: 'The variable loads cause no bending moment.' };
	}
	let lo = hi === 1 ? 0 : hi / 2;
	for (let k = 0; k < 200 && hi - lo > 1e-13 * hi; k++) {
		const mid = (lo + hi) / 2;
		if (ratioAt(mid).ratio <= 1) lo = mid;
		else hi = mid;
	}
	return { status: 'reached', factor: assertFinite(lo, 'elastic limit factor'), x: ratioAt(hi).x };
}

function findWorstRatio(
	fixed: ElasticResult,
	variable: ElasticResult,
	lambda: number,
	geo: { nodes: number[]; breakpoints: number[][]; limit: number[] }
): { ratio: number; x: number } {
	let worst = { ratio: -1, x: 0 };
	geo.breakpoints.forEach((bp, e) => {
		const x0 = geo.nodes[e];
		const L = geo.nodes[e + 1] - x0;
		// Inside the span `at` must not jump to a neighbour: read the end from its left side.
		const read = (s: number, side: Side) => {
			const sd: Side = s >= L ? 'left' : s <= 0 ? 'right' : side;
			const f = fixed.at(x0 + s, sd);
			const v = variable.at(x0 + s, sd);
			return { M: f.M + lambda * v.M, V: f.V + lambda * v.V };
		};
		for (const c of listMomentCandidates({ L, breakpoints: bp, read })) {
			const ratio = Math.abs(c.M) / geo.limit[e];
			if (ratio > worst.ratio) worst = { ratio, x: x0 + c.s };
		}
	});
	return worst;
}

/** Input of `firstYieldFactor`: the elastic moment resistance per span. */
export interface FirstYieldInput extends Omit<ElasticLimitInput, 'limit'> {
	/** Wel,y·fy/γM0 per span, N·mm. */
	elasticResistance: number[];
}

/** Input of `firstHingeFactor`: the plastic moment resistance per span. */
export interface FirstHingeInput extends Omit<ElasticLimitInput, 'limit'> {
	/** Mp,Rd = Wpl,y·fy/γM0 per span, N·mm. */
	plasticResistance: number[];
}

/**
 * Factor on the variable loads at first yield (|M| = Wel·fy/γM0 somewhere), fixed loads held.
 * @example
 * // pin–pin span, only a variable central load P: factor = 4·Wel·fy/(P·L)
 */
export function firstYieldFactor(input: FirstYieldInput): ElasticLimitResult {
	const { elasticResistance, ...rest } = input;
	return computeElasticLimitFactor({ ...rest, limit: elasticResistance });
}

/**
 * Factor on the variable loads at which the elastic moment first reaches Mp (the first plastic
 * hinge), fixed loads held. In a statically determinate beam this equals the collapse factor.
 */
export function firstHingeFactor(input: FirstHingeInput): ElasticLimitResult {
	const { plasticResistance, ...rest } = input;
	return computeElasticLimitFactor({ ...rest, limit: plasticResistance });
}
