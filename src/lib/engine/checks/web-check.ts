/**
 * Local web resistance where a point load or a support reaction bears on an unstiffened I web
 * (EN 1993-1-5 section 6), one row per bearing point, worst load arrangement. Hollow and solid
 * sections are not checked (said in the notices); built-in ends carry no flange bearing.
 */
import { E_STEEL } from '../units';
import { listPointLoadPositions, readReactions, type CheckContext } from './context';
import { applyArrangement } from './factor-loads';
import type { WebLoadType } from './en1993/web';
import type { LoadArrangement } from './load-arrangements';
import { spanOf } from './plastic-bending';
import type { CheckResult } from './types';
import { findWorstArrangement } from './worst-arrangement';

/** Stiff bearing lengths, mm. */
export interface BearingLengths {
	/** One per support node. */
	supports: number[];
	/** Under point loads. */
	loads: number;
}

/** One row per support and per point-load position on an I-section web. */
export function checkBeamWebs(ctx: CheckContext, bearing: BearingLengths): CheckResult[] {
	const out: CheckResult[] = [];
	const last = ctx.nodes.length - 1;
	const s = ctx.beam.supports;
	const supportNodes = new Set(ctx.nodes.filter((_, i) => s[i] !== 'free'));
	ctx.nodes.forEach((x, node) => {
		if (s[node] !== 'pin') return;
		const atEnd = node === 0 || node === last;
		const row = checkPoint(ctx, {
			x,
			span: node === last ? node - 1 : node,
			type: atEnd ? 'c' : 'a',
			ss: bearing.supports[node] ?? 0,
			label: `Web at support ${node + 1}`,
			force: (arr, t) => Math.max(...readReactions(ctx, arr, t).map((r) => Math.abs(r[node])))
		});
		if (row) out.push(row);
	});
	const designLoads = new Map<LoadArrangement, ReturnType<typeof applyArrangement>>();
	for (const x of listPointLoadPositions(ctx.loads)) {
		if (supportNodes.has(x)) continue;
		const type: WebLoadType = x === 0 || x === ctx.nodes[last] ? 'c' : 'a';
		const row = checkPoint(ctx, {
			x,
			span: spanOf(ctx.nodes, x),
			type,
			ss: bearing.loads,
			label: 'Web under point load',
			force(arr, t) {
				let d = designLoads.get(arr);
				if (!d) {
					d = applyArrangement({ loads: ctx.loads, spans: ctx.beam.spans, arrangement: arr });
					designLoads.set(arr, d);
				}
				const sum = (ls: typeof d.fixed) =>
					ls.reduce((a, l) => a + (l.kind === 'point' && l.x === x ? l.value : 0), 0);
				return Math.abs(sum(d.fixed) + t * sum(d.variable));
			}
		});
		if (row) out.push(row);
	}
	return out;
}

function checkPoint(
	ctx: CheckContext,
	p: {
		x: number;
		span: number;
		type: WebLoadType;
		ss: number;
		label: string;
		force: (arr: LoadArrangement, t: number) => number;
	}
): CheckResult | null {
	const m = ctx.members[p.span];
	if (!m.propsKnown || (m.shape !== 'I' && m.shape !== 'welded-I')) return null;
	const web = ctx.basis.computeWebResistance({
		type: p.type,
		hw: m.hw,
		tw: m.tw,
		bf: m.b,
		tf: m.tf,
		fyw: m.fy,
		fyf: m.fy,
		E: E_STEEL,
		ss: p.ss,
		c: 0,
		gammaM1: ctx.gammaM1
	});
	const ss = Math.min(p.ss, m.hw);
	const worst = findWorstArrangement(ctx.arrangements, (arr, t) => {
		const fEd = p.force(arr, t);
		return { utilisation: fEd / web.fRd, detail: fEd };
	});
	return {
		id: 'web',
		label: p.label,
		clause: 'EN 1993-1-5 6 (clause numbers from memory)',
		level: 'governing',
		utilisation: worst.utilisation,
		utilisationExisting: worst.utilisationExisting,
		pass: worst.utilisation <= 1,
		multiplierAtCapacity: worst.multiplier,
		values: {
			fEd: worst.detail,
			fRd: web.fRd,
			ss,
			kF: web.kF,
			ly: web.ly,
			chiF: web.chiF,
			lEff: web.lEff
		},
		x: p.x,
		arrangement: worst.arrangement.name,
		note: `Load type (${p.type}) of EN 1993-1-5 Figure 6.1, stiff bearing ${Math.round(ss)} mm.`
	};
}
