/**
 * The verdict: pass, fail or outside scope, from the route and the evaluated checks. Only
 * `governing`-level checks decide; `warning`-level checks (deflection by default) are reported.
 */
import { assertFinite } from '../model/issue';
import type { ScopeDecision } from './basis-types';
import type { AnalysisRoute, CheckResult, VerdictKind } from './types';

/**
 * Share of capacity used by the existing loads alone above which a warning is given. 80 % is
 * common practice, not a code value.
 */
export const EXISTING_LOAD_WARNING = 0.8;

/** The decision and what it rests on. */
export interface Verdict {
	verdict: VerdictKind;
	route: AnalysisRoute;
	/** Why this route (and, when outside scope, why). */
	routeReasons: string[];
	/** The check with the smallest multiplier at capacity (or the highest utilisation). */
	governing: { id: string; label: string; utilisation: number } | null;
	/** Collapse load factor on the temporary loads (plastic route), else the first-hinge factor. */
	loadFactor: number | null;
	/** Smallest multiplier on the temporary loads at which any governing check reaches 1. */
	allowableMultiplier: number | null;
	/** (allowableMultiplier − 1) × 100, %. */
	reserve: number | null;
	/** Plain-text warnings (existing loads near capacity, warning-level checks exceeded). */
	warnings: string[];
}

/**
 * Decides the verdict.
 * @param o.loadFactor collapse (or first-hinge) factor on the temporary loads, when computed
 * @example
 * decideVerdict({ scope, checks, loadFactor: 1.4 }).verdict // 'pass' if every governing check ≤ 1
 */
export function decideVerdict(o: {
	scope: ScopeDecision;
	checks: CheckResult[];
	loadFactor: number | null;
}): Verdict {
	const { scope, checks } = o;
	const warnings = collectWarnings(checks);
	if (scope.route === 'outside-scope') {
		return {
			verdict: 'outside-scope',
			route: scope.route,
			routeReasons: scope.reasons,
			governing: null,
			loadFactor: null,
			allowableMultiplier: null,
			reserve: null,
			warnings
		};
	}
	const counted = checks.filter((c) => c.level === 'governing');
	const governing = pickGoverning(counted);
	const multipliers = counted.map(rank).filter((m) => m !== Number.MAX_VALUE);
	const allowable = multipliers.length > 0 ? Math.min(...multipliers) : null;
	return {
		verdict: counted.every((c) => c.pass) ? 'pass' : 'fail',
		route: scope.route,
		routeReasons: scope.reasons,
		governing: governing && {
			id: governing.id,
			label: governing.label,
			utilisation: assertFinite(governing.utilisation, 'governing utilisation')
		},
		loadFactor: o.loadFactor === null ? null : assertFinite(o.loadFactor, 'load factor'),
		allowableMultiplier:
			allowable === null ? null : assertFinite(allowable, 'allowable multiplier'),
		reserve: allowable === null ? null : (allowable - 1) * 100,
		warnings
	};
}

/** The check that limits the temporary load first; ties and unaffected checks by utilisation. */
function pickGoverning(checks: CheckResult[]): CheckResult | null {
	let best: CheckResult | null = null;
	for (const c of checks) {
		if (best === null) best = c;
		else if (rank(c) < rank(best) || (rank(c) === rank(best) && c.utilisation > best.utilisation)) {
			best = c;
		}
	}
	return best;
}

/**
 * The multiplier a check allows. A check the temporary load does not affect allows any
 * multiplier while it passes, and none (0) when the other loads already fail it.
 */
function rank(c: CheckResult): number {
	if (c.multiplierAtCapacity !== null) return Math.max(0, c.multiplierAtCapacity);
	return c.pass ? Number.MAX_VALUE : 0;
}

function collectWarnings(checks: CheckResult[]): string[] {
	const out: string[] = [];
	const existing = Math.max(
		0,
		...checks.filter((c) => c.level === 'governing').map((c) => c.utilisationExisting ?? 0)
	);
	if (existing > EXISTING_LOAD_WARNING) {
		out.push(
			`The existing loads alone already use ${Math.round(existing * 100)} % of the capacity ` +
				`(warning above ${EXISTING_LOAD_WARNING * 100} %, common practice).`
		);
	}
	for (const c of checks) {
		if (c.level === 'warning' && !c.pass) {
			const u = Math.round(c.utilisation * 100);
			out.push(`${c.label}: utilisation ${u} % (reported, not counted in the verdict).`);
		}
	}
	return out;
}
