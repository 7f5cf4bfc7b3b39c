/**
 * The transverse forces the web check looks at and where each stands: reactions at pinned
 * supports (bottom flange), point loads (top flange), and a point load over a pinned support
 * taken together with its reaction (both flanges: the force passes straight through the web).
 * Built-in supports carry no flange bearing, so neither they nor loads over them are listed.
 */
import { listPointLoadPositions, readReactions, type CheckContext } from './context';
import { applyArrangement } from './factor-loads';
import type { LoadArrangement } from './load-arrangements';
import { spanOf } from './plastic-bending';

/** The flange a force enters by; 'both' for a load over a support. */
export type LoadedFlange = 'top' | 'bottom' | 'both';

/** One bearing point on the web. */
export interface WebForce {
	x: number;
	span: number;
	/** Stiff bearing length, mm (centred on x, or running from the end at a beam end). */
	ss: number;
	throughWeb: boolean;
	/** Clear distance from the end of the stiff bearing to the nearer beam end, mm. */
	endDistance: number;
	/** The nearer beam end in words: 'the free end', 'the supported end', 'the built-in end'. */
	endWord: string;
	flange: LoadedFlange;
	/** 'support 2' or 'point load 3' (point loads counted left to right by position). */
	name: string;
	/** Design force at multiplier t on the temporary loads, N (magnitude). */
	force: (arr: LoadArrangement, t: number) => number;
	/** What the force is the larger of: the reaction at this node, the point loads at this x. */
	sources: { node: number | null; loadAt: number | null };
}

/** Every bearing point of the beam, supports first, then point loads left to right. */
export function listWebForces(
	ctx: CheckContext,
	bearing: { supports: number[]; loads: number }
): WebForce[] {
	const s = ctx.beam.supports;
	const last = ctx.nodes.length - 1;
	const pointForce = makePointForce(ctx);
	const positions = listPointLoadPositions(ctx.loads);
	const out: WebForce[] = [];
	ctx.nodes.forEach((x, node) => {
		if (s[node] !== 'pin') return;
		const reaction = (arr: LoadArrangement, t: number) =>
			Math.max(...readReactions(ctx, arr, t).map((r) => Math.abs(r[node])));
		const ssSupport = bearing.supports[node] ?? 0;
		const loaded = positions.includes(x);
		// Over a support the load and the reaction share the web: the shorter bearing and the one
		// reaching nearer the end are the cautious pair, the larger force the one to carry.
		const ss = loaded ? Math.min(ssSupport, bearing.loads) : ssSupport;
		const reach = loaded ? Math.max(ssSupport, bearing.loads) : ssSupport;
		out.push({
			x,
			span: node === last ? node - 1 : node,
			ss,
			throughWeb: loaded,
			...nearestEnd(ctx, x, reach),
			flange: loaded ? 'both' : 'bottom',
			name: `support ${node + 1}`,
			force: loaded ? (arr, t) => Math.max(reaction(arr, t), pointForce(x, arr, t)) : reaction,
			sources: { node, loadAt: loaded ? x : null }
		});
	});
	positions.forEach((x, i) => {
		const node = ctx.nodes.indexOf(x);
		if (node >= 0 && s[node] !== 'free') return;
		out.push({
			x,
			span: spanOf(ctx.nodes, x),
			ss: bearing.loads,
			throughWeb: false,
			...nearestEnd(ctx, x, bearing.loads),
			flange: 'top',
			name: `point load ${i + 1}`,
			force: (arr, t) => pointForce(x, arr, t),
			sources: { node: null, loadAt: x }
		});
	});
	return out;
}

const END_WORDS = {
	free: 'the free end',
	pin: 'the supported end',
	fixed: 'the built-in end'
} as const;

/** Clear distance from a bearing of length ss centred on x to the nearer beam end, and its name. */
function nearestEnd(ctx: CheckContext, x: number, ss: number) {
	const last = ctx.nodes.length - 1;
	const total = ctx.nodes[last];
	const node = x <= total - x ? 0 : last;
	const kind = ctx.beam.supports[node];
	const endWord = END_WORDS[kind];
	return { endDistance: Math.max(0, Math.min(x, total - x) - ss / 2), endWord };
}

/**
 * Design point load at x (all point loads there together). Per arrangement the sums at every
 * position are formed once, in load order as before, so a beam with many loads reads each in
 * constant time.
 */
function makePointForce(ctx: CheckContext) {
	const cache = new Map<
		LoadArrangement,
		{ fixed: Map<number, number>; variable: Map<number, number> }
	>();
	const sumByPosition = (ls: ReturnType<typeof applyArrangement>['fixed']) => {
		const out = new Map<number, number>();
		for (const l of ls) if (l.kind === 'point') out.set(l.x, (out.get(l.x) ?? 0) + l.value);
		return out;
	};
	return (x: number, arr: LoadArrangement, t: number) => {
		let d = cache.get(arr);
		if (!d) {
			const a = applyArrangement({ loads: ctx.loads, spans: ctx.beam.spans, arrangement: arr });
			d = { fixed: sumByPosition(a.fixed), variable: sumByPosition(a.variable) };
			cache.set(arr, d);
		}
		return Math.abs((d.fixed.get(x) ?? 0) + t * (d.variable.get(x) ?? 0));
	};
}
