/**
 * Runs every design check on a beam and decides the verdict: factor sets and load arrangements,
 * the scope gate, the bending route (plastic collapse or elastic), shear, bending with shear,
 * lateral-torsional buckling, web bearing and deflection.
 */
import type { ElasticResult } from '../elastic/index';
import { checkElasticBending } from './bending-check';
import type { CheckContext } from './context';
import { summariseCharacteristicEffects } from './characteristic-effects';
import { checkBeamDeflections } from './deflection-check';
import { sampleDesignMoments, type DesignMoments } from './design-moments';
import { writeReportWording } from './basis-wording';
import type { DesignBasis } from './design-basis';
import { releaseRedundants } from './determinate';
import type { FactorSettings } from './basis-types';
import { DEFAULT_BASIS } from './bases';
import type { ScopeDecision, ScopeInput, SectionClass } from './basis-types';
import type { DesignCheckInput, DesignCheckOutcome } from './inputs';
import { checkBeamInteraction } from './interaction-check';
import { listLoadArrangements, MAX_PATTERNED_SPANS } from './load-arrangements';
import { analyseLoadGroups } from './load-effects';
import { checkBeamLtb } from './ltb-check';
import { describeMember, type SpanMember } from './member';
import { listNotices } from './notices';
import {
	cannotRestrainHinges,
	HINGES_UNRESTRAINABLE,
	runPlasticRoute,
	solveCollapseForInformation
} from './plastic-route';
import { listRestraintSegments } from './restraint';
import { checkBeamShear, computeSpanShearResistances } from './shear-check';
import type { CheckResult } from './types';
import { decideVerdict } from './verdict';
import { checkBeamWebs } from './web-check';

type Basis = DesignBasis<FactorSettings>;

/**
 * Checks a beam under its loads with the EN 1993 basis (or another basis).
 * @example
 * runDesignChecks(input).verdict.verdict // 'pass' | 'fail' | 'outside-scope'
 */
/** Options of repeated runs on one beam (the governing curve). */
export interface DesignRunOptions {
	/** Elastic analyses shared between runs on the same beam (only the proposed load changes). */
	memo?: Map<string, ElasticResult>;
	/** Buckling energy matrices shared the same way (see `prepareCriticalMoment`). */
	bucklingMemo?: Map<string, Float64Array>;
	/**
	 * Only the verdict is read (the governing curve): what cannot change the allowable multiplier
	 * or what governs is left out — the information-only collapse, rows that are reported but not
	 * counted (deflection by default), the design-moment diagram and the characteristic summary.
	 */
	verdictOnly?: boolean;
}

export function runDesignChecks(
	input: DesignCheckInput,
	basis: Basis = DEFAULT_BASIS,
	options: DesignRunOptions = {}
): DesignCheckOutcome {
	const { beam } = input;
	const members = input.sections.map((s, i) => describeMember(s, input.grades[i]?.fy ?? 0));
	const classes = input.sections.map(
		(s, i) => basis.classifySection(s, members[i].fy || 235).class
	);
	const sectionClass = Math.max(...classes.map((c) => c ?? 1)) as SectionClass;
	const hasImposed = input.loads.some((l) => l.action === 'imposed');
	const factors = basis.resolveFactors(input.factors, { hasImposed });
	const nodes = [0];
	for (const s of beam.spans) nodes.push(nodes[nodes.length - 1] + s);
	const imposedSpans = beam.spans.flatMap((_, i) => {
		const on = (l: DesignCheckInput['loads'][number]) =>
			l.action === 'imposed' && overlaps(l, nodes[i], nodes[i + 1]);
		return input.loads.some(on) ? [i] : [];
	});
	const scopeBase = buildScopeInput(input, basis, { members, sectionClass, imposedSpans });
	const notes = listNotices({
		restraintGiven: input.restraint !== null,
		hollow: members.some((m) => m.propsKnown && m.shape !== 'I' && m.shape !== 'welded-I'),
		bearingGiven: input.bearing !== null
	});
	const mpRd = members.map((m) => m.mp * factors.resistance.section);
	const wording = writeReportWording(basis, factors);
	const base = { basis: basis.name, wording, factors, sectionClass, mpRd, ...notes };
	const early = basis.decideRoute(scopeBase);
	if (early.route === 'outside-scope') {
		const verdict = decideVerdict({ scope: early, checks: [], loadFactor: null });
		const none = {
			arrangementCount: 0,
			bendingArrangement: null,
			collapse: null,
			effects: null,
			checks: []
		};
		return { ...base, ...none, verdict };
	}
	const arrangements = listLoadArrangements({
		combinations: factors.combinations,
		spanCount: beam.spans.length,
		imposedSpans
	});
	const allKnown = members.every((m) => m.propsKnown);
	const EI = members.map((m) => (allKnown ? basis.E * m.Iy : 1));
	// Forces on the released beam do not depend on stiffness: unit EI.
	const unit = beam.spans.map(() => 1);
	const released = analyseLoadGroups({
		beam: releaseRedundants(beam),
		EI: unit,
		loads: input.loads,
		memo: options.memo
	});
	const ctx: CheckContext = {
		basis,
		beam,
		nodes,
		members,
		loads: input.loads,
		arrangements,
		effects: analyseLoadGroups({ beam, EI, loads: input.loads, memo: options.memo }),
		resistance: factors.resistance,
		eta: input.eta ?? 1,
		route: early.route,
		plastic: new Map(),
		released,
		bucklingMemo: options.bucklingMemo
	};
	const run = runChecks(ctx, input, {
		scopeBase,
		early,
		EI,
		allKnown,
		verdictOnly: options.verdictOnly ?? false
	});
	const loadFactor =
		run.route.route === 'plastic' ? (run.collapse?.loadFactor ?? null) : bendingFactor(run.checks);
	const verdict = decideVerdict({ scope: run.route, checks: run.checks, loadFactor });
	const bendingRow = run.checks.find((c) => c.id === 'bending');
	const bendingArrangement = arrangements.find((a) => a.name === bendingRow?.arrangement) ?? null;
	return {
		...base,
		arrangementCount: arrangements.length,
		bendingArrangement,
		collapse: run.collapse,
		designMoments: run.designMoments ?? null,
		effects: options.verdictOnly
			? null
			: summariseCharacteristicEffects(ctx.effects, members, allKnown),
		checks: run.checks,
		verdict
	};
}

/** Scope facts known before any analysis (the plastic route adds the hinge facts later). */
function buildScopeInput(
	input: DesignCheckInput,
	basis: Basis,
	o: { members: SpanMember[]; sectionClass: SectionClass; imposedSpans: number[] }
): ScopeInput {
	const eta = input.eta ?? 1;
	const slender = o.members.some((m) => {
		if (!m.propsKnown || m.shape === 'CHS' || m.shape === 'flat') return false;
		// One web's thickness: hollow sections store both webs in tw.
		const tw = m.shape === 'RHS' ? m.tw / 2 : m.tw;
		return basis.checkWebSlenderness({ hw: m.hw, tw, fy: m.fy, eta }).needsShearBucklingCheck;
	});
	const other: string[] = [];
	if (o.imposedSpans.length > MAX_PATTERNED_SPANS) {
		other.push(`Imposed load on more than ${MAX_PATTERNED_SPANS} spans: too many patterns to try.`);
	}
	return {
		sectionClass: o.sectionClass,
		ductile: input.grades.every((g) => g === null || g.ductile),
		gradeConfirmed: input.gradeConfirmed ?? !input.grades.some((g) => g?.needsConfirmation),
		needsShearBucklingCheck: slender,
		collapseCertified: true,
		hingesRestrained: true,
		otherReasons: other
	};
}

/** The bending route and every member check. */
function runChecks(
	ctx: CheckContext,
	input: DesignCheckInput,
	o: {
		scopeBase: ScopeInput;
		early: ScopeDecision;
		EI: number[];
		allKnown: boolean;
		verdictOnly: boolean;
	}
): {
	route: ScopeDecision;
	collapse: DesignCheckOutcome['collapse'];
	checks: CheckResult[];
	designMoments?: DesignMoments | null;
} {
	const { beam, members } = ctx;
	const restraint = input.restraint ?? { kind: 'continuous' as const };
	const segments = listRestraintSegments({ spans: beam.spans, supports: beam.supports, restraint });
	const vRd = computeSpanShearResistances(ctx);
	const checks: CheckResult[] = [];
	let route = o.early;
	let collapse: DesignCheckOutcome['collapse'] = null;
	let informationOnly = false;
	let elasticResistance: number[] | null = null;
	if (route.route === 'plastic' && cannotRestrainHinges(ctx, restraint)) {
		// Exact shortcut: no arrangement's mechanism could use the plastic route.
		route = ctx.basis.decideRoute({
			...o.scopeBase,
			hingesRestrained: false,
			hingeRestraintNote: HINGES_UNRESTRAINABLE
		});
		informationOnly = true;
	} else if (route.route === 'plastic') {
		const plastic = runPlasticRoute(ctx, { segments, vRd, scopeBase: o.scopeBase });
		route = plastic.scope;
		collapse = plastic.collapse;
		if (route.route === 'plastic') checks.push(plastic.bending);
		else ctx.plastic.clear();
	}
	ctx.route = route.route;
	if (route.route === 'outside-scope') return { route, collapse, checks };
	const elastic = route.route === 'elastic-first-yield';
	if (route.route !== 'plastic') {
		if (!o.allKnown) {
			const reason = 'Only Mp is known for a span: the elastic checks need the section properties.';
			return { route: { route: 'outside-scope', reasons: [reason] }, collapse, checks };
		}
		const resistance = members.map((m) =>
			ctx.basis.computeBendingResistance({ ...m, resistance: ctx.resistance, elastic })
		);
		elasticResistance = resistance;
		const bending = checkElasticBending(ctx, { EI: o.EI, resistance, elastic });
		checks.push(bending);
		if (informationOnly && !o.verdictOnly) {
			// The collapse is shown for information, for the arrangement that governs bending.
			const arrangement = ctx.arrangements.find((a) => a.name === bending.arrangement);
			if (arrangement) collapse = solveCollapseForInformation(ctx, { arrangement, vRd });
		}
		const inter = checkBeamInteraction(ctx, { vRd, elastic });
		if (inter) checks.push(inter);
	}
	const shear = checkBeamShear(ctx, vRd);
	if (shear) checks.push(shear);
	const { loadHeight } = input;
	const ltb = checkBeamLtb(ctx, { segments, loadHeight, elasticModulus: elastic });
	checks.push(...ltb.checks);
	if (ltb.outOfScope.length > 0) {
		route = { route: 'outside-scope', reasons: [...new Set(ltb.outOfScope)] };
	}
	checks.push(...checkBeamWebs(ctx, input.bearing ?? { supports: [], loads: 0 }, segments));
	const deflection = deflectionInput(ctx, input);
	if (o.allKnown && (deflection.governing || !o.verdictOnly)) {
		checks.push(...checkBeamDeflections(deflection));
	}
	const designMoments =
		elasticResistance && route.route !== 'outside-scope' && !o.verdictOnly
			? sampleDesignMoments(ctx, {
					governing: pickBendingGoverning(checks),
					checks,
					resistance: elasticResistance
				})
			: null;
	return { route, collapse, checks, designMoments };
}

/** The bending or buckling row that limits the proposed load first (its arrangement is drawn). */
function pickBendingGoverning(checks: CheckResult[]): CheckResult | undefined {
	const rank = (c: CheckResult) => c.multiplierAtCapacity ?? Number.MAX_VALUE;
	return checks
		.filter((c) => c.id === 'ltb' || c.id === 'bending')
		.reduce<CheckResult | undefined>(
			(best, c) => (!best || rank(c) < rank(best) ? c : best),
			undefined
		);
}

function deflectionInput(ctx: CheckContext, input: DesignCheckInput) {
	const s = ctx.beam.supports;
	return {
		spans: ctx.beam.spans,
		cantilever: ctx.beam.spans.map((_, i) => s[i] === 'free' || s[i + 1] === 'free'),
		temporary: ctx.effects.characteristic.temporary,
		all: ctx.effects.characteristic.all,
		limitTemporary: input.deflectionLimit ?? ctx.basis.words.deflectionLimits.temporary,
		limitTotal: input.deflectionLimitTotal ?? ctx.basis.words.deflectionLimits.total,
		governing: input.deflectionGoverning ?? false
	};
}

function bendingFactor(checks: CheckResult[]): number | null {
	return checks.find((c) => c.id === 'bending')?.multiplierAtCapacity ?? null;
}

function overlaps(l: DesignCheckInput['loads'][number], a: number, b: number): boolean {
	if (l.kind === 'point') return l.x >= a && l.x <= b;
	return l.to > a && l.from < b;
}
