/**
 * Shear check over the beam (EN 1993-1-1 6.2.6): the largest design shear at the span ends and
 * beside every point load, against Vpl,Rd of that span, worst load arrangement.
 */
import { listShearPoints, readShears, type CheckContext } from './context';
import { selectLinearArrangements } from './linear-arrangements';
import type { LoadArrangement } from './load-arrangements';
import type { CheckResult } from './types';
import { findWorstArrangement } from './worst-arrangement';

/** Plastic shear resistance per span, N, or null where the section is known only by Mp. */
export function computeSpanShearResistances(ctx: CheckContext): (number | null)[] {
	return ctx.members.map((m) => {
		if (!m.propsKnown) return null;
		const Av = ctx.basis.computeShearArea({ ...m, eta: ctx.eta });
		if (Av === null) return null;
		return ctx.basis.computeShearResistance({ ...m, Av, resistance: ctx.resistance });
	});
}

/**
 * The shear check, or null when no span has a known shear resistance.
 */
export function checkBeamShear(ctx: CheckContext, vRd: (number | null)[]): CheckResult | null {
	if (vRd.every((v) => v === null)) return null;
	const points = listShearPoints(ctx);
	const worst = findWorstArrangement(selectArrangements(ctx, vRd, points), (arr, t) => {
		let best = { utilisation: 0, vEd: 0, vRd: 0, x: 0 };
		for (const p of points) {
			const r = vRd[p.span];
			if (r === null) continue;
			const vEd = Math.max(...readShears(ctx, arr, p.x, p.side, t).map(Math.abs));
			if (vEd / r > best.utilisation) best = { utilisation: vEd / r, vEd, vRd: r, x: p.x };
		}
		return { utilisation: best.utilisation, detail: best };
	});
	const d = worst.detail;
	return {
		id: 'shear',
		label: 'Shear',
		clause: ctx.basis.words.clauses.shear,
		level: 'governing',
		utilisation: worst.utilisation,
		utilisationExisting: worst.utilisationExisting,
		pass: worst.utilisation <= 1,
		multiplierAtCapacity: worst.multiplier,
		values: { vEd: d.vEd, vRd: d.vRd },
		x: d.x,
		arrangement: worst.arrangement.name,
		note:
			ctx.plastic.size > 0
				? 'Larger of the elastic shear and that of the collapse moment field at the design load.'
				: 'Elastic shear.'
	};
}

/**
 * Elastic shear is linear in the group weights, so the sign of each group's shear at each point
 * picks the arrangements worth evaluating; the collapse field of the plastic route is not.
 */
function selectArrangements(
	ctx: CheckContext,
	vRd: (number | null)[],
	points: ReturnType<typeof listShearPoints>
): LoadArrangement[] {
	if (ctx.plastic.size > 0) return ctx.arrangements;
	const groups = ctx.effects.groups;
	const readings = points.flatMap((p) => {
		const r = vRd[p.span];
		if (r === null) return [];
		const up = groups.map((g) => g.at(p.x, p.side).V / r);
		return [up, up.map((v) => -v)];
	});
	return selectLinearArrangements(ctx.arrangements, groups, readings);
}
