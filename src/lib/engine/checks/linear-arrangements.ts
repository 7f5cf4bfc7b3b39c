/**
 * The arrangements worth evaluating for a check whose utilisation is the largest of readings
 * linear in the load-group weights (shear, a web force with the moment beside it). For one
 * reading and one combination the worst pattern follows from signs alone: permanent load takes
 * the factor that raises the reading, and a span's imposed load is on exactly when it raises it.
 * Every other arrangement is kept only when it comes close enough to change the answer: its
 * reading within round-off of the worst at the design loads or under the fixed loads alone, or
 * its multiplier at capacity within 1e-5 of the smallest. Beyond that margin the multiplier
 * search (tolerance 1e-6) cannot return a smaller value, so the check's answer is the same as
 * evaluating every arrangement.
 */
import type { LoadArrangement } from './load-arrangements';
import type { LoadGroup } from './load-effects';

/**
 * Coefficients of one reading per load group (same order as the groups): the reading of an
 * arrangement at multiplier t is Σ weight·coefficient, the temporary weight taken × t, and a
 * reading of 1 is the capacity.
 */
export type LinearReading = number[];

/** Set by tests to evaluate every arrangement (the reference the selection is checked against). */
export const arrangementSelection = { exhaustive: false };

/** Relative margin on the multiplier beyond which an arrangement cannot govern. */
const ROOT_MARGIN = 1e-5;
/** Largest multiplier the search looks at (as root-find.ts), with room. */
const SEARCH_LIMIT = 2e6;

interface Family {
	/** Indices into the arrangement list. */
	members: number[];
	gammaGsup: number;
	gammaGinf: number;
	gammaImposed: number;
	gammaTemporary: number;
	/** Patterned spans of the combination. */
	spans: number[];
	/** `${permanent}|${mask over spans}` → arrangement index. */
	index: Map<string, number>;
}

/**
 * The arrangements (in list order) whose evaluation gives the same worst utilisations and
 * multiplier as evaluating all of them.
 */
export function selectLinearArrangements(
	arrangements: LoadArrangement[],
	groups: LoadGroup[],
	readings: LinearReading[]
): LoadArrangement[] {
	if (arrangementSelection.exhaustive || readings.length === 0) return arrangements;
	const families = groupFamilies(arrangements);
	const extremes = readings.flatMap((coef) => families.map((f) => findExtreme(f, groups, coef)));
	let u1 = -Infinity;
	let u0 = -Infinity;
	let root = Infinity;
	for (const e of extremes) {
		u1 = Math.max(u1, e.top + e.slope);
		u0 = Math.max(u0, e.top);
		if (e.top >= 1) root = 0;
		else if (e.slope > 0) root = Math.min(root, (1 - e.top) / e.slope);
	}
	const reach = root * (1 + ROOT_MARGIN);
	const keep = new Set<number>();
	for (const e of extremes) {
		// Round-off of this sum against the checks' own: generous, it only adds arrangements.
		const slack =
			1e-9 * (e.size + Math.abs(e.slope) * Math.max(1, Number.isFinite(reach) ? reach : 1));
		let room = Math.max(e.top + e.slope - u1, e.top - u0);
		if (root <= SEARCH_LIMIT) room = Math.max(room, e.top + reach * e.slope - 1);
		if (room + slack >= 0) listWithin(e, room + slack, keep);
	}
	return arrangements.filter((_, i) => keep.has(i));
}

interface Extreme {
	family: Family;
	/** Largest fixed-load reading over the family's patterns, and the slope per unit t. */
	top: number;
	slope: number;
	/** Sum of the magnitudes that make up `top` (for the round-off slack). */
	size: number;
	permanent: 'sup' | 'inf';
	/** Per patterned span: on in the worst pattern, and what turning it over costs. */
	on: boolean[];
	costs: { what: 'permanent' | number; cost: number }[];
}

function findExtreme(family: Family, groups: LoadGroup[], coef: LinearReading): Extreme {
	let permanent = 0;
	let temporary = 0;
	const bySpan = new Map<number, number>();
	groups.forEach((g, i) => {
		if (g.kind === 'permanent') permanent += coef[i];
		else if (g.kind === 'temporary') temporary += coef[i];
		else if (g.span !== undefined) bySpan.set(g.span, (bySpan.get(g.span) ?? 0) + coef[i]);
	});
	const sup = family.gammaGsup * permanent;
	const inf = family.gammaGinf * permanent;
	let top = Math.max(sup, inf);
	let size = Math.abs(sup) + Math.abs(inf);
	const costs: Extreme['costs'] = [{ what: 'permanent', cost: Math.abs(sup - inf) }];
	const on = family.spans.map((span, k) => {
		const v = family.gammaImposed * (bySpan.get(span) ?? 0);
		top += Math.max(0, v);
		size += Math.abs(v);
		costs.push({ what: k, cost: Math.abs(v) });
		return v > 0;
	});
	costs.sort((a, b) => a.cost - b.cost);
	return {
		family,
		top,
		slope: family.gammaTemporary * temporary,
		size,
		permanent: sup >= inf ? 'sup' : 'inf',
		on,
		costs
	};
}

/** Adds every pattern of the family whose reading is within `room` of the worst one. */
function listWithin(e: Extreme, room: number, keep: Set<number>): void {
	const visit = (from: number, left: number, permanent: 'sup' | 'inf', on: boolean[]) => {
		const mask = on.map((b) => (b ? '1' : '0')).join('');
		const found = e.family.index.get(`${permanent}|${mask}`);
		if (found !== undefined) keep.add(found);
		for (let c = from; c < e.costs.length; c++) {
			const { what, cost } = e.costs[c];
			// Costs are sorted: once one is too dear, so are the rest.
			if (cost > left) return;
			if (what === 'permanent') visit(c + 1, left - cost, permanent === 'sup' ? 'inf' : 'sup', on);
			else
				visit(
					c + 1,
					left - cost,
					permanent,
					on.map((b, k) => (k === what ? !b : b))
				);
		}
	};
	visit(0, room, e.permanent, e.on);
}

/** Arrangements by combination, with each one's place in the list. */
function groupFamilies(arrangements: LoadArrangement[]): Family[] {
	const byName = new Map<string, Family>();
	arrangements.forEach((a, i) => {
		let f = byName.get(a.combination);
		if (!f) {
			f = {
				members: [],
				gammaGsup: a.gammaG,
				gammaGinf: a.gammaG,
				gammaImposed: 0,
				gammaTemporary: a.gammaTemporary,
				spans: [],
				index: new Map()
			};
			byName.set(a.combination, f);
		}
		f.members.push(i);
		if (a.permanent === 'sup') f.gammaGsup = a.gammaG;
		else f.gammaGinf = a.gammaG;
		a.imposedBySpan.forEach((v, span) => {
			if (v === 0) return;
			f.gammaImposed = v;
			if (!f.spans.includes(span)) f.spans.push(span);
		});
	});
	for (const f of byName.values()) {
		f.spans.sort((a, b) => a - b);
		for (const i of f.members) {
			const a = arrangements[i];
			const mask = f.spans.map((s) => (a.imposedBySpan[s] !== 0 ? '1' : '0')).join('');
			f.index.set(`${a.permanent}|${mask}`, i);
		}
	}
	return [...byName.values()];
}
