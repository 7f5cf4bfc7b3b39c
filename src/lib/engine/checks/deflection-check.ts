/**
 * Deflection rows: under the unfactored temporary load and under all unfactored loads, per span,
 * the worst span reported. Counted as `warning` unless the settings make them governing.
 */
import type { ElasticResult } from '../elastic/index';
import { checkDeflection } from './deflection';
import type { CheckResult } from './types';

/** Options of {@link checkBeamDeflections}. */
export interface DeflectionRowsInput {
	spans: number[];
	/** True per span when it is a cantilever (one end free). */
	cantilever: boolean[];
	temporary: ElasticResult | null;
	all: ElasticResult | null;
	/** span/limit for the temporary load and for all loads. */
	limitTemporary: number;
	limitTotal: number;
	governing: boolean;
}

/** The two deflection rows (a row is left out when its loads are absent). */
export function checkBeamDeflections(o: DeflectionRowsInput): CheckResult[] {
	const out: CheckResult[] = [];
	const level = o.governing ? 'governing' : 'warning';
	if (o.temporary) {
		const w = worstSpan(o, o.temporary, o.limitTemporary);
		out.push({
			id: 'deflection-temporary',
			label: 'Deflection under the temporary load',
			clause: `span/${o.limitTemporary} (common practice, not a code value)`,
			level,
			utilisation: w.check.utilisation,
			utilisationExisting: 0,
			pass: w.check.utilisation <= 1,
			multiplierAtCapacity: w.check.deflection > 0 ? 1 / w.check.utilisation : null,
			values: { deflection: w.check.deflection, allowed: w.check.allowed, span: o.spans[w.span] },
			x: w.x,
			note: 'Unfactored temporary load, elastic.'
		});
	}
	if (o.all) {
		const w = worstSpan(o, o.all, o.limitTotal);
		const dT = o.temporary ? Math.abs(o.temporary.at(w.x).w) : 0;
		const existing = Math.max(0, w.check.deflection - dT);
		out.push({
			id: 'deflection-total',
			label: 'Deflection under all loads',
			clause: `span/${o.limitTotal} (common practice, not a code value)`,
			level,
			utilisation: w.check.utilisation,
			utilisationExisting: existing / w.check.allowed,
			pass: w.check.utilisation <= 1,
			multiplierAtCapacity: dT > 0 ? Math.max(0, (w.check.allowed - existing) / dT) : null,
			values: { deflection: w.check.deflection, allowed: w.check.allowed, span: o.spans[w.span] },
			x: w.x,
			note: 'All loads unfactored, elastic; multiplier read at the point of largest deflection.'
		});
	}
	return out;
}

function worstSpan(o: DeflectionRowsInput, r: ElasticResult, limit: number) {
	let best: { span: number; x: number; check: ReturnType<typeof checkDeflection> } | null = null;
	r.maxDeflection.spans.forEach((v, span) => {
		const check = checkDeflection({
			deflection: v.value,
			span: o.spans[span],
			cantilever: o.cantilever[span],
			limit
		});
		if (!best || check.utilisation > best.check.utilisation) best = { span, x: v.x, check };
	});
	if (!best) throw new Error('invariant: a beam has at least one span');
	return best as { span: number; x: number; check: ReturnType<typeof checkDeflection> };
}
