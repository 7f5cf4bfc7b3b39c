/**
 * The static theorem as a conservative grid linear program in CPLEX LP text, for a general-purpose
 * solver (HiGHS) to cross-check the engine. Independent of the engine's code: moments and shears
 * at grid points are the unknowns, equilibrium is written between neighbouring points, and each
 * interval's moment may bulge above its chord by max|w|·h²/8, which the yield rows allow for, so
 * the answer is a true lower bound. Units: kN, m, kN·m (as in the test specs).
 */
import type { LoadSpec, ProblemSpec } from './builders';

/** Default grid intervals per beam length (breakpoints are added on top). */
const GRID = 300;

interface Grid {
	x: number[];
	/** Index of each node in x. */
	nodeAt: number[];
}

function buildGrid(spec: ProblemSpec, perBeam: number): Grid {
	const nodes = [0];
	for (const s of spec.spans) nodes.push(nodes[nodes.length - 1] + s);
	const L = nodes[nodes.length - 1];
	const breaks = new Set<number>(nodes);
	for (const l of [...(spec.fixed ?? []), ...spec.variable]) {
		if ('P' in l) breaks.add(l.at);
		else [l.from, l.to].forEach((v) => breaks.add(v));
	}
	for (const s of toSegments(spec)) [s.from, s.to].forEach((v) => breaks.add(v));
	const sorted = [...breaks].filter((v) => v >= 0 && v <= L).sort((a, b) => a - b);
	const x: number[] = [];
	sorted.forEach((a, i) => {
		const b = sorted[i + 1];
		if (i > 0 && a - x[x.length - 1] < 1e-9) return;
		x.push(a);
		if (b === undefined) return;
		const k = Math.ceil(((b - a) / L) * perBeam);
		for (let j = 1; j < k; j++) x.push(a + ((b - a) * j) / k);
	});
	return { x, nodeAt: nodes.map((n) => x.findIndex((v) => Math.abs(v - n) < 1e-9)) };
}

/** Line-load intensity of the loads at the two ends of [a, b] (the loads are linear on it). */
function intensities(loads: LoadSpec[], a: number, b: number): [number, number] {
	let wl = 0;
	let wr = 0;
	const mid = (a + b) / 2;
	for (const l of loads) {
		if ('P' in l || !(l.from < mid && l.to > mid)) continue;
		const at = (x: number) =>
			'w' in l ? l.w : l.w1 + ((l.w2 - l.w1) * (x - l.from)) / (l.to - l.from);
		wl += at(a);
		wr += at(b);
	}
	return [wl, wr];
}

type Segment = { from: number; to: number; sag: number; hog: number };

/** The resistance as segments, whichever of the three forms the spec uses. */
function toSegments(spec: ProblemSpec): Segment[] {
	const L = spec.spans.reduce((a, b) => a + b, 0);
	if (typeof spec.Mp === 'number') return [{ from: 0, to: L, sag: spec.Mp, hog: spec.Mp }];
	if (typeof spec.Mp[0] === 'number') {
		let x = 0;
		return (spec.Mp as number[]).map((m, i) => {
			const seg = { from: x, to: x + spec.spans[i], sag: m, hog: m };
			x += spec.spans[i];
			return seg;
		});
	}
	return spec.Mp as Segment[];
}

function capacityAt(spec: ProblemSpec, x: number): { sag: number; hog: number } {
	const segs = toSegments(spec);
	const seg = segs.find((s) => x >= s.from - 1e-9 && x <= s.to + 1e-9) ?? segs[segs.length - 1];
	return { sag: seg.sag, hog: seg.hog };
}

const num = (v: number) => (Number.isFinite(v) ? v.toPrecision(17) : '0');
const term = (c: number, name: string) =>
	c === 0 ? '' : ` ${c < 0 ? '-' : '+'} ${num(Math.abs(c))} ${name}`;

/** The discretised static theorem as CPLEX LP text (maximise λ); perBeam grid intervals over the length. */
export function writeGridProgram(spec: ProblemSpec, perBeam = GRID): string {
	const { x, nodeAt } = buildGrid(spec, perBeam);
	const N = x.length - 1;
	const fixed = spec.fixed ?? [];
	const reaction = new Map<number, string>();
	spec.supports.forEach((s, k) => {
		if (s !== 'free') reaction.set(nodeAt[k], `r${k}`);
	});
	const pointAt = (loads: LoadSpec[], i: number) =>
		loads.reduce((s, l) => s + ('P' in l && Math.abs(l.at - x[i]) < 1e-9 ? l.P : 0), 0);
	const rows: string[] = [];
	const r = (i: number) => (reaction.has(i) ? term(-1, reaction.get(i) as string) : '');
	const W = (loads: LoadSpec[], i: number) => {
		const [wl, wr] = intensities(loads, x[i], x[i + 1]);
		const h = x[i + 1] - x[i];
		return {
			W: (h * (wl + wr)) / 2,
			F: (h * h * (2 * wl + wr)) / 6,
			B: (Math.max(Math.abs(wl), Math.abs(wr)) * h * h) / 8
		};
	};
	for (let i = 0; i <= N; i++) {
		const Pv = pointAt(spec.variable, i);
		const Pf = pointAt(fixed, i);
		const prev =
			i > 0 ? { v: W(spec.variable, i - 1), f: W(fixed, i - 1) } : { v: { W: 0 }, f: { W: 0 } };
		const lamCoef = prev.v.W + Pv;
		const rhs = -(prev.f.W + Pf);
		const left = i > 0 ? term(-1, `v${i - 1}`) : '';
		const here = i < N ? term(1, `v${i}`) : '';
		rows.push(`shear${i}:${here}${left}${r(i)}${term(lamCoef, 'lam')} = ${num(rhs)}`);
	}
	for (let i = 0; i < N; i++) {
		const h = x[i + 1] - x[i];
		const v = W(spec.variable, i);
		const f = W(fixed, i);
		rows.push(
			`moment${i}:${term(1, `m${i + 1}`)}${term(-1, `m${i}`)}${term(-h, `v${i}`)}${term(v.F, 'lam')} = ${num(-f.F)}`
		);
		const mid = capacityAt(spec, (x[i] + x[i + 1]) / 2);
		for (const e of [i, i + 1]) {
			rows.push(`sag${i}_${e}:${term(1, `m${e}`)}${term(v.B, 'lam')} <= ${num(mid.sag - f.B)}`);
			rows.push(`hog${i}_${e}:${term(-1, `m${e}`)}${term(v.B, 'lam')} <= ${num(mid.hog - f.B)}`);
		}
	}
	if (spec.supports[0] !== 'fixed') rows.push('end0: m0 = 0');
	if (spec.supports[spec.spans.length] !== 'fixed') rows.push(`endN: m${N} = 0`);
	(spec.joints ?? []).forEach((j, k) => {
		if (j === 'simple') rows.push(`joint${k}: m${nodeAt[k + 1]} = 0`);
	});
	const free = [
		...x.map((_, i) => `m${i}`),
		...x.slice(0, N).map((_, i) => `v${i}`),
		...reaction.values()
	];
	return [
		'Maximize',
		' obj: lam',
		'Subject To',
		...rows.map((s) => ` ${s}`),
		'Bounds',
		...free.map((n) => ` ${n} free`),
		' lam >= 0',
		'End'
	].join('\n');
}
