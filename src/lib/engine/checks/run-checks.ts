/**
 * Runs every design check on a beam and decides the verdict: factor sets and load arrangements,
 * the scope gate, the bending route (plastic collapse or elastic), shear, bending with shear,
 * lateral-torsional buckling, web bearing and deflection.
 */
import { analyseElastic } from '../elastic/index';
import { classifySectionEN } from '../section/index';
import { E_STEEL } from '../units';
import { checkElasticBending } from './bending-check';
import type { CheckContext } from './context';
import { checkBeamDeflections } from './deflection-check';
import { DEFAULT_DEFLECTION_LIMIT } from './deflection';
import type { DesignBasis } from './design-basis';
import { releaseRedundants } from './determinate';
import { en1993 } from './en1993/index';
import type { FactorSettings } from './en1993/factors';
import type { SectionClass } from './en1993/scope';
import type { DesignCheckInput, DesignCheckOutcome } from './inputs';
import { checkBeamInteraction } from './interaction-check';
import { listLoadArrangements, MAX_PATTERNED_SPANS } from './load-arrangements';
import { analyseLoadGroups } from './load-effects';
import { checkBeamLtb } from './ltb-check';
import { describeMember } from './member';
import { listNotices } from './notices';
import { runPlasticRoute } from './plastic-route';
import { listRestraintSegments } from './restraint';
import { checkBeamShear, computeSpanShearResistances } from './shear-check';
import type { CheckResult } from './types';
import { decideVerdict } from './verdict';
import { checkBeamWebs } from './web-check';

/**
 * Checks a beam under its loads with the EN 1993 basis (or another basis).
 * @example
 * runDesignChecks(input).verdict.verdict // 'pass' | 'fail' | 'outside-scope'
 */
export function runDesignChecks(
	input: DesignCheckInput,
	basis: DesignBasis<FactorSettings> = en1993
): DesignCheckOutcome {
	const { beam } = input;
	const fy = input.grades.map((g) => g?.fy ?? 0);
	const members = input.sections.map((s, i) => describeMember(s, fy[i]));
	const classes = input.sections.map((s, i) => classifySectionEN(s, fy[i] || 235).class);
	const sectionClass = Math.max(...classes.map((c) => c ?? 1)) as SectionClass;
	const hasImposed = input.loads.some((l) => l.action === 'imposed');
	const factors = basis.resolveFactors(input.factors, { hasImposed });
	const nodes = [0];
	for (const s of beam.spans) nodes.push(nodes[nodes.length - 1] + s);
	const imposedSpans = beam.spans.flatMap((_, i) =>
		input.loads.some((l) => l.action === 'imposed' && overlapsSpan(l, nodes[i], nodes[i + 1])) ? [i] : []
	);
	const eta = input.eta ?? 1;
	const other: string[] = [];
	if (imposedSpans.length > MAX_PATTERNED_SPANS) {
		other.push(`Imposed load on more than ${MAX_PATTERNED_SPANS} spans: too many patterns to try exactly.`);
	}
	const needsShearBuckling = members.some(
		(m) => m.propsKnown && m.shape !== 'CHS' && m.shape !== 'flat' && basis.checkWebSlenderness({ hw: m.hw, tw: m.shape === 'RHS' ? m.tw / 2 : m.tw, fy: m.fy, eta }).needsShearBucklingCheck
	);
	const scopeBase = {
		sectionClass,
		ductile: input.grades.every((g) => g === null || g.ductile),
		gradeConfirmed: input.gradeConfirmed ?? !input.grades.some((g) => g?.needsConfirmation),
		needsShearBucklingCheck: needsShearBuckling,
		collapseCertified: true,
		hingesRestrained: true,
		otherReasons: other
	};
	const notes = listNotices({
		restraintGiven: input.restraint !== null,
		hollow: members.some((m) => m.shape !== 'I' && m.shape !== 'welded-I'),
		bearingGiven: input.bearing !== null
	});
	const early = basis.decideRoute(scopeBase);
	const base = { basis: basis.name, factors, sectionClass, ...notes };
	if (early.route === 'outside-scope') {
		const verdict = decideVerdict({ scope: early, checks: [], loadFactor: null });
		return { ...base, arrangementCount: 0, bendingArrangement: null, collapse: null, checks: [], verdict };
	}
	const arrangements = listLoadArrangements({ combinations: factors.combinations, spanCount: beam.spans.length, imposedSpans });
	const allKnown = members.every((m) => m.propsKnown);
	const EI = members.map((m) => (allKnown ? E_STEEL * m.Iy : 1));
	const effects = analyseLoadGroups({ beam, EI, loads: input.loads });
	const temporary = input.loads.filter((l) => l.action === 'temporary');
	const released = temporary.length
		? analyseElastic({ beam: releaseRedundants(beam), EI: beam.spans.map(() => 1), loads: temporary })
		: null;
	const ctx: CheckContext = {
		basis,
		beam,
		nodes,
		members,
		loads: input.loads,
		arrangements,
		effects,
		gammaM0: factors.gammaM0,
		gammaM1: factors.gammaM1,
		eta,
		route: early.route,
		plastic: new Map(),
		released: released && released.ok ? released.value : null
	};
	const restraint = input.restraint ?? { kind: 'continuous' as const };
	const segments = listRestraintSegments({ spans: beam.spans, supports: beam.supports, restraint });
	const vRd = computeSpanShearResistances(ctx);
	const checks: CheckResult[] = [];
	let route = early;
	let collapse: DesignCheckOutcome['collapse'] = null;
	if (early.route === 'plastic') {
		const plastic = runPlasticRoute(ctx, { segments, vRd, scopeBase });
		route = plastic.scope;
		collapse = plastic.collapse;
		if (route.route === 'plastic') checks.push(plastic.bending);
		else ctx.plastic.clear();
	}
	ctx.route = route.route;
	const elastic = route.route === 'elastic-first-yield';
	if (route.route !== 'plastic' && route.route !== 'outside-scope') {
		if (!allKnown) {
			route = { route: 'outside-scope', reasons: ['Only Mp is known for a span: the elastic checks need the section properties.'] };
		} else {
			const resistance = members.map((m) => basis.computeBendingResistance({ Wpl: m.Wpl, Wel: m.Wel, fy: m.fy, gammaM0: factors.gammaM0, elastic }));
			checks.push(checkElasticBending(ctx, { EI, resistance, elastic }));
			const inter = checkBeamInteraction(ctx, { vRd, elastic });
			if (inter) checks.push(inter);
		}
	}
	if (route.route !== 'outside-scope') {
		const shear = checkBeamShear(ctx, vRd);
		if (shear) checks.push(shear);
		const ltb = checkBeamLtb(ctx, { segments, loadHeight: input.loadHeight, elasticModulus: elastic });
		checks.push(...ltb.checks);
		if (ltb.outOfScope.length > 0) route = { route: 'outside-scope', reasons: [...new Set(ltb.outOfScope)] };
		checks.push(...checkBeamWebs(ctx, input.bearing ?? { supports: [], loads: 0 }));
		if (allKnown) {
			checks.push(
				...checkBeamDeflections({
					spans: beam.spans,
					cantilever: beam.spans.map((_, i) => beam.supports[i] === 'free' || beam.supports[i + 1] === 'free'),
					temporary: effects.characteristic.temporary,
					all: effects.characteristic.all,
					limitTemporary: input.deflectionLimit ?? DEFAULT_DEFLECTION_LIMIT,
					limitTotal: input.deflectionLimitTotal ?? DEFAULT_DEFLECTION_LIMIT,
					governing: input.deflectionGoverning ?? false
				})
			);
		}
	}
	const loadFactor = route.route === 'plastic' ? (collapse?.loadFactor ?? null) : bendingFactor(checks);
	const verdict = decideVerdict({ scope: route, checks, loadFactor });
	const bendingRow = checks.find((c) => c.id === 'bending');
	const bendingArrangement = arrangements.find((a) => a.name === bendingRow?.arrangement) ?? null;
	return { ...base, arrangementCount: arrangements.length, bendingArrangement, collapse, checks, verdict };
}

function bendingFactor(checks: CheckResult[]): number | null {
	return checks.find((c) => c.id === 'bending')?.multiplierAtCapacity ?? null;
}

function overlapsSpan(l: DesignCheckInput['loads'][number], a: number, b: number): boolean {
	if (l.kind === 'point') return l.x >= a && l.x <= b;
	return l.to > a && l.from < b;
}
