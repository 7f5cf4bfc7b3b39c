/**
 * Bending with shear on the elastic routes (EN 1993-1-1 6.2.8): at span ends and beside point
 * loads, |M| against My,V,Rd for the shear there. (On the plastic route the reduction is built
 * into the hinge capacities instead.) Class 3 uses (1 − ρ)·Wel·fy/γM0, a conservative
 * simplification of the elastic interaction.
 */
import { listShearPoints, type CheckContext } from './context';
import { preparePointEffects } from './point-effects';
import type { CheckResult } from './types';
import { findWorstArrangement } from './worst-arrangement';

interface InteractionOptions {
	vRd: (number | null)[];
	elastic: boolean;
}

/** The interaction row, or null when no span has a known shear resistance. */
export function checkBeamInteraction(ctx: CheckContext, o: InteractionOptions): CheckResult | null {
	const clause = ctx.basis.words.clauses.interaction;
	if (clause === null || o.vRd.every((v) => v === null)) return null;
	const points = listShearPoints(ctx);
	const read = preparePointEffects(ctx.effects, points);
	// The unreduced resistance at each point (most points see no reduction at most loads).
	const mRd = points.map((p) =>
		o.vRd[p.span] === null ? 0 : reducedResistance(ctx, o, p.span, 0)
	);
	const worst = findWorstArrangement(ctx.arrangements, (arr, t) => {
		const e = read(arr);
		let best = { utilisation: 0, mEd: 0, vEd: 0, rho: 0, mvRd: 0, x: 0 };
		points.forEach((p, i) => {
			const vplRd = o.vRd[p.span];
			if (vplRd === null) return;
			const mEd = Math.abs(e.fixedM[i] + t * e.variableM[i]);
			const vEd = Math.abs(e.fixedV[i] + t * e.variableV[i]);
			const rho = ctx.basis.computeShearReduction({ vEd, vplRd });
			const mvRd = rho === 0 ? mRd[i] : reducedResistance(ctx, o, p.span, rho);
			const u = mvRd > 0 ? mEd / mvRd : mEd > 0 ? Number.MAX_VALUE : 0;
			if (u > best.utilisation) best = { utilisation: u, mEd, vEd, rho, mvRd, x: p.x };
		});
		return { utilisation: best.utilisation, detail: best };
	});
	const d = worst.detail;
	return {
		id: 'interaction',
		label: 'Bending with shear',
		clause,
		level: 'governing',
		utilisation: worst.utilisation,
		utilisationExisting: worst.utilisationExisting,
		pass: worst.utilisation <= 1,
		multiplierAtCapacity: worst.multiplier,
		values: { mEd: d.mEd, vEd: d.vEd, rho: d.rho, myVRd: d.mvRd },
		x: d.x,
		arrangement: worst.arrangement.name
	};
}

/** The bending resistance of a span reduced for shear by ρ. */
function reducedResistance(
	ctx: CheckContext,
	o: InteractionOptions,
	span: number,
	rho: number
): number {
	const m = ctx.members[span];
	return o.elastic
		? (1 - rho) * m.Wel * m.fy * ctx.resistance.section
		: ctx.basis.computeReducedMomentResistance({
				Wpl: m.Wpl,
				Aw: m.hw * m.tw,
				tw: m.tw,
				fy: m.fy,
				resistance: ctx.resistance,
				rho
			});
}
