/**
 * The bending row. Plastic route: the exact collapse factor over all arrangements (with shear
 * reductions at hinges). Elastic routes: the factor at which the elastic moment first reaches
 * the section resistance. Utilisation is 1/(factor on all design loads together), so it is
 * ≤ 1 exactly when the beam carries the design loads.
 */
import { solveCollapse } from '../collapse/index';
import { computeElasticLimitFactor } from '../elastic/index';
import {
	buildPieceGrid,
	combineMomentPieces,
	findPieceLimitFactor,
	fitMomentPieces,
	measureMomentRatio
} from '../elastic/moment-pieces';
import { splitLoadsBySpan } from '../elastic/element-loads';
import type { Load } from '../model/types';
import type { BasisWords } from './basis-types';
import type { CheckContext } from './context';
import { applyArrangement } from './factor-loads';
import type { LoadArrangement } from './load-arrangements';
import type { PlasticArrangement } from './plastic-bending';
import type { CheckResult } from './types';

/** The arrangement with the smallest collapse factor (null factors count as unbounded). */
export function pickGoverningCollapse(all: PlasticArrangement[]): PlasticArrangement {
	let best = all[0];
	for (const p of all) {
		const lower = best.loadFactor === null || (p.loadFactor ?? Infinity) < best.loadFactor;
		if (p.loadFactor !== null && lower) best = p;
	}
	return best;
}

/** Bending row of the plastic route. */
export function describePlasticBending(ctx: CheckContext, g: PlasticArrangement): CheckResult {
	const { loads, beam } = ctx;
	const d = applyArrangement({ loads, spans: beam.spans, arrangement: g.arrangement });
	const inverse = (variableLoads: Load[]) => {
		if (variableLoads.length === 0) return 0;
		const r = solveCollapse({ beam, capacity: g.capacity, fixedLoads: [], variableLoads });
		return r.status === 'unbounded' || r.status === 'fails-under-fixed' ? 0 : 1 / r.loadFactor;
	};
	const utilisation = inverse([...d.fixed, ...d.variable]);
	const values: Record<string, number> = {};
	if (g.loadFactor !== null) values.loadFactor = g.loadFactor;
	g.reductions.forEach((r, i) => {
		values[`rho${i + 1}`] = r.rho;
		values[`myVRd${i + 1}`] = r.myVRd;
		values[`vEd${i + 1}`] = r.vEd;
	});
	const n = g.reductions.length;
	const words = ctx.basis.words;
	const reduced = n > 0 ? ` ${words.hingeShearReduction} at ${n} hinge(s).` : '';
	const mechanism = 'mechanism' in g.result ? `Mechanism: ${g.result.mechanism.name}.` : '';
	return {
		id: 'bending',
		label: words.labels.plasticBending,
		clause: words.clauses.plasticBending,
		level: 'governing',
		utilisation,
		utilisationExisting: inverse(d.fixed),
		pass: g.loadFactor === null || g.loadFactor >= 1,
		multiplierAtCapacity: g.loadFactor,
		values,
		x: 'hinges' in g.result ? g.result.hinges[0]?.x : undefined,
		arrangement: g.arrangement.name,
		note: `${mechanism}${reduced}`.trim() || undefined
	};
}

type ElasticBendingOptions = { EI: number[]; resistance: number[]; elastic: boolean };
type Worst = { arr: LoadArrangement; factor: number | null; x?: number };

/**
 * Bending row of an elastic route; `resistance` per span, N·mm. Each load group's moment is
 * fitted once as cubic pieces and every arrangement is a weighted sum of them (elastic analysis
 * is linear), so no arrangement is analysed again.
 */
export function checkElasticBending(ctx: CheckContext, o: ElasticBendingOptions): CheckResult {
	const groups = ctx.effects.groups;
	const loadsBySpan = splitLoadsBySpan(ctx.beam, ctx.loads);
	const grid = buildPieceGrid(ctx.nodes, loadsBySpan);
	const pieces = groups.map((g) => fitMomentPieces(g.result, grid));
	let worst: Worst | null = null;
	let utilisation = 0;
	let existing = 0;
	for (const arr of ctx.arrangements) {
		const fixedW = groups.map((g) => (g.kind === 'temporary' ? 0 : g.weight(arr)));
		const fixed = combineMomentPieces(pieces, fixedW);
		const variable = combineMomentPieces(
			pieces,
			groups.map((g, i) => g.weight(arr) - fixedW[i])
		);
		// |M|/limit is linear in the loads: the utilisations are ratios, with no search.
		const ratioAt = (t: number) => measureMomentRatio(fixed, variable, t, grid, o.resistance);
		const underFixed = ratioAt(0).ratio;
		utilisation = Math.max(utilisation, ratioAt(1).ratio);
		existing = Math.max(existing, underFixed);
		// The ratio is convex in the multiplier: below 1 at 0 and at the least factor so far, it
		// stays below 1 up to there, and this arrangement cannot lower that factor.
		const least = worst?.factor;
		if (least != null && underFixed <= 1 && ratioAt(least).ratio < 1) continue;
		const f = findPieceLimitFactor(fixed, variable, grid, o.resistance);
		const factor = f.status === 'reached' ? f.factor : f.status === 'fails-under-fixed' ? 0 : null;
		const x = f.status === 'never' ? undefined : f.x;
		if (!worst || (factor !== null && (least == null || factor < least))) {
			worst = { arr, factor, x };
		}
	}
	return describeElasticBending(worst, utilisation, existing, o.elastic, ctx.basis.words);
}

/**
 * The same row by analysing every arrangement afresh and searching each one (the former way,
 * kept to check the fast one against in tests).
 */
export function checkElasticBendingByReanalysis(
	ctx: CheckContext,
	o: ElasticBendingOptions
): CheckResult {
	let worst: Worst | null = null;
	let utilisation = 0;
	let existing = 0;
	for (const arr of ctx.arrangements) {
		const d = applyArrangement({ loads: ctx.loads, spans: ctx.beam.spans, arrangement: arr });
		const run = (fixedLoads: Load[], variableLoads: Load[]) =>
			computeElasticLimitFactor({
				beam: ctx.beam,
				EI: o.EI,
				fixedLoads,
				variableLoads,
				limit: o.resistance
			});
		const inverse = (loads: Load[]) => {
			if (loads.length === 0) return 0;
			const r = run([], loads);
			return r.status === 'reached' ? 1 / r.factor : 0;
		};
		const f = run(d.fixed, d.variable);
		const factor = f.status === 'reached' ? f.factor : f.status === 'fails-under-fixed' ? 0 : null;
		utilisation = Math.max(utilisation, inverse([...d.fixed, ...d.variable]));
		existing = Math.max(existing, inverse(d.fixed));
		const x = f.status === 'reached' || f.status === 'fails-under-fixed' ? f.x : undefined;
		const lower = factor !== null && (worst?.factor == null || factor < worst.factor);
		if (!worst || lower) worst = { arr, factor, x };
	}
	return describeElasticBending(worst, utilisation, existing, o.elastic, ctx.basis.words);
}

function describeElasticBending(
	worst: Worst | null,
	utilisation: number,
	existing: number,
	elastic: boolean,
	words: BasisWords
): CheckResult {
	if (!worst) throw new Error('invariant: at least one load arrangement');
	return {
		id: 'bending',
		label: elastic ? words.labels.elasticFirstYield : words.labels.elasticPlasticSection,
		clause: elastic ? words.clauses.elasticFirstYield : words.clauses.elasticPlasticSection,
		level: 'governing',
		utilisation,
		utilisationExisting: existing,
		pass: utilisation <= 1,
		multiplierAtCapacity: worst.factor,
		values: worst.factor === null ? {} : { loadFactor: worst.factor },
		x: worst.x,
		arrangement: worst.arr.name
	};
}
