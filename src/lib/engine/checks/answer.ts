/**
 * The answer a user reads first: the verdict, the check that governs, the largest factor on the
 * proposed temporary loads that every deciding check allows, and what that means for each
 * proposed load. It is read straight from the verdict, so no other figure can stand in for it.
 */
import type { Load } from '../model/types';
import type { DesignCheckOutcome } from './inputs';
import type { VerdictKind } from './types';

/** What a proposed load may grow to, internal units (N for a point load, N/mm for a line load). */
export interface AllowableLoad {
	/** Index in the case's own load list. */
	index: number;
	kind: Load['kind'];
	/** As entered (peak of a linear load), signed: downward positive. */
	entered: number;
	/** Largest size every deciding check allows, same direction as entered; null when unlimited. */
	value: number | null;
	direction: 'down' | 'up';
	/**
	 * `limited`: a deciding check limits it; `relieves`: it acts against the other loads and no
	 * deciding check limits it; `not-limited`: no deciding check is affected by it.
	 */
	effect: 'limited' | 'relieves' | 'not-limited';
}

/** The governing answer of a design run. */
export interface Answer {
	/** null when no non-zero proposed load was entered: there is nothing to decide. */
	verdict: VerdictKind | null;
	governing: { id: string; label: string } | null;
	/** Smallest multiplier on the proposed loads over every deciding check; null outside scope. */
	multiplier: number | null;
	/** multiplier − 1. */
	reserve: number | null;
	/** Utilisation of the governing check at the loads as entered. */
	utilisation: number | null;
	allowable: AllowableLoad[];
	/** Why the beam is outside scope, and what would bring it in. */
	reasons: string[];
	/** True when every proposed load is zero or none was entered. */
	noProposedLoad: boolean;
	/** True when every non-zero proposed load acts upward and nothing limits them. */
	relievesOnly: boolean;
	/** True when the existing loads alone already fail a deciding check. */
	existingFail: boolean;
}

/** Peak intensity of a load, signed (the larger end of a linear load). */
function peakOf(l: Load): number {
	if (l.kind !== 'linear') return l.value;
	return Math.abs(l.end) > Math.abs(l.start) ? l.end : l.start;
}

/**
 * Decides the answer from the checks.
 * @param loads the case's own loads in file order (self-weight excluded), internal units
 */
export function decideAnswer(checked: DesignCheckOutcome, loads: Load[]): Answer {
	const v = checked.verdict;
	const proposed = loads.flatMap((l, index) => (l.action === 'temporary' ? [{ l, index }] : []));
	const active = proposed.filter(({ l }) => peakOf(l) !== 0);
	const existingFail = checked.checks.some(
		(c) => c.level === 'governing' && (c.utilisationExisting ?? 0) > 1
	);
	const none = {
		governing: null,
		multiplier: null,
		reserve: null,
		utilisation: null,
		allowable: [],
		reasons: [] as string[],
		relievesOnly: false,
		existingFail
	};
	if (v.verdict === 'outside-scope') {
		return {
			...none,
			verdict: 'outside-scope',
			reasons: v.routeReasons,
			noProposedLoad: active.length === 0
		};
	}
	if (active.length === 0) return { ...none, verdict: null, noProposedLoad: true };
	const m = v.allowableMultiplier;
	const allowable = proposed.map(({ l, index }): AllowableLoad => {
		const entered = peakOf(l);
		const direction = entered < 0 ? 'up' : 'down';
		if (m === null) {
			const effect = entered < 0 ? 'relieves' : 'not-limited';
			return { index, kind: l.kind, entered, value: null, direction, effect };
		}
		return {
			index,
			kind: l.kind,
			entered,
			value: m * Math.abs(entered),
			direction,
			effect: 'limited'
		};
	});
	return {
		verdict: v.verdict,
		governing: v.governing && { id: v.governing.id, label: v.governing.label },
		multiplier: m,
		reserve: m === null ? null : m - 1,
		utilisation: v.governing?.utilisation ?? null,
		allowable,
		reasons: [],
		noProposedLoad: false,
		relievesOnly: m === null && active.every(({ l }) => peakOf(l) < 0),
		existingFail
	};
}
