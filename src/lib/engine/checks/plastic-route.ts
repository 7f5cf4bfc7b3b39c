/**
 * The plastic route: collapse of every load arrangement, the governing one, whether its hinges
 * are restrained enough, and the bending row. Falls back to an elastic route when they are not.
 */
import { applyArrangement } from './factor-loads';
import { describePlasticBending, pickGoverningCollapse } from './bending-check';
import { buildCapacity } from './capacity';
import type { CheckContext } from './context';
import type { ScopeDecision, ScopeInput } from './basis-types';
import { checkHingeRestraint } from './hinge-restraint';
import type { CollapseSummary } from './inputs';
import type { LoadArrangement } from './load-arrangements';
import { solvePlasticArrangement, type PlasticArrangement } from './plastic-bending';
import type { RestraintSegment } from './restraint';
import type { CheckResult } from './types';

/** Outcome of the plastic route. */
export interface PlasticRouteOutcome {
	scope: ScopeDecision;
	collapse: CollapseSummary;
	bending: CheckResult;
}

/** Why no plastic hinge can be restrained, when that follows from the restraint alone. */
export const HINGES_UNRESTRAINABLE =
	'the flange is held only at the supports and every mechanism of this beam needs a hinge ' +
	'inside a span';

/**
 * True when the restraint alone rules the plastic route out: with the compression flange held
 * only at the supports and no free end, every span that moves in a mechanism needs a hinge inside
 * it, away from any restraint. (A hinge within h/2 of a support would need a shear far above
 * Vpl,Rd to reach Mp so close to it; treating that case elastically is on the safe side.)
 */
export function cannotRestrainHinges(ctx: CheckContext, restraint: { kind: string }): boolean {
	return restraint.kind === 'ends-only' && !ctx.beam.supports.includes('free');
}

/**
 * The collapse of one arrangement, for information where another route decides: solved with the
 * shear reduction at its hinges, as the plastic route would, without entering ctx.plastic.
 */
export function solveCollapseForInformation(
	ctx: CheckContext,
	o: { arrangement: LoadArrangement; vRd: (number | null)[] }
): CollapseSummary {
	return summariseCollapse(solveArrangement(ctx, o.arrangement, o.vRd));
}

/** One arrangement's collapse with the design Mp (Mp × the section multiplier) and the shear reduction at its hinges. */
function solveArrangement(
	ctx: CheckContext,
	arrangement: LoadArrangement,
	vRd: (number | null)[]
): PlasticArrangement {
	const capacity = buildCapacity(
		ctx.beam.spans,
		ctx.members.map((m) => m.mp * ctx.resistance.section)
	);
	const d = applyArrangement({ loads: ctx.loads, spans: ctx.beam.spans, arrangement });
	return solvePlasticArrangement({
		basis: ctx.basis,
		beam: ctx.beam,
		members: ctx.members,
		nodes: ctx.nodes,
		capacity,
		arrangement,
		fixedLoads: d.fixed,
		variableLoads: d.variable,
		effects: ctx.effects,
		released: ctx.released,
		vplRd: vRd,
		resistance: ctx.resistance
	});
}

/** The report's view of one arrangement's collapse. */
function summariseCollapse(g: PlasticArrangement): CollapseSummary {
	const r = g.result;
	const hinges = 'hinges' in r ? r.hinges : [];
	return {
		loadFactor: g.loadFactor,
		certified: g.certified,
		mechanism: 'mechanism' in r ? r.mechanism.name : null,
		hinges: hinges.map((h) => ({ x: h.x, moment: h.moment })),
		arrangement: g.arrangement.name,
		reductions: g.reductions,
		result: r,
		capacity: g.capacity
	};
}

/** Solves the plastic route (fills ctx.plastic with every arrangement's collapse). */
export function runPlasticRoute(
	ctx: CheckContext,
	o: { segments: RestraintSegment[]; vRd: (number | null)[]; scopeBase: ScopeInput }
): PlasticRouteOutcome {
	const all = ctx.arrangements.map((arrangement) => {
		const p = solveArrangement(ctx, arrangement, o.vRd);
		ctx.plastic.set(arrangement, p);
		return p;
	});
	const g = pickGoverningCollapse(all);
	const r = g.result;
	const hinges = 'hinges' in r ? r.hinges : [];
	const restraint =
		'diagram' in r
			? checkHingeRestraint({
					basis: ctx.basis,
					hinges,
					diagram: r.diagram,
					segments: o.segments,
					nodes: ctx.nodes,
					members: ctx.members,
					loadPositions: ctx.loads.map((l) =>
						l.kind === 'point' ? { from: l.x, to: l.x } : { from: l.from, to: l.to }
					)
				})
			: { ok: true };
	const scope = ctx.basis.decideRoute({
		...o.scopeBase,
		collapseCertified: isCertified(all, g),
		hingesRestrained: restraint.ok,
		hingeRestraintNote: restraint.reason
	});
	return {
		scope,
		collapse: summariseCollapse(g),
		bending: describePlasticBending(ctx, g)
	};
}

/**
 * The governing collapse must be certified; another arrangement whose bounds did not meet
 * matters only if its lower bound could undercut the governing factor.
 */
function isCertified(all: PlasticArrangement[], g: PlasticArrangement): boolean {
	if (!g.certified) return false;
	const lambda = g.loadFactor;
	return all.every(
		(p) =>
			p.certified || (lambda !== null && 'lowerBound' in p.result && p.result.lowerBound >= lambda)
	);
}
