/**
 * Elastic critical moment Mcr of one segment of a doubly symmetric beam, for any moment diagram
 * and load height, by the Rayleigh–Ritz energy method (Timoshenko & Gere, Theory of Elastic
 * Stability, ch. 6). Fork supports at the segment ends (u = φ = 0, warping free) make the sine
 * series u = Σ aₙ sin(nπx/L), φ = Σ bₙ sin(nπx/L) complete and the stiffness matrix
 * diagonal:
 *   U = ½∫(EIz u''² + GIt φ'² + EIw φ''²) dx
 *   V = ∫ M u'' φ dx − ½∫ q·zg φ² dx − ½ Σ P·zg φ(xP)²
 * (zg > 0: load above the shear centre)
 * The critical factor λcr on the segment's loads is the smallest positive λ with
 * det(K − λG) = 0; Mcr = λcr · max|M|.
 */
import { lineLoadAt, computeSegmentMoment, type LtbSegment } from './segment-moment';
import { computeLargestEigenvalue } from './largest-eigenvalue';
import { prepareSegmentPeak } from './segment-peak';

/** Inputs of {@link computeCriticalMoment}; N, mm. */
export interface CriticalMomentInput {
	segment: LtbSegment;
	/** Bending stiffness about the minor axis E·Iz, N·mm². */
	EIz: number;
	/** Torsional stiffness G·It, N·mm². */
	GIt: number;
	/** Warping stiffness E·Iw, N·mm⁴. */
	EIw: number;
	/** Height of the load point above the shear centre, mm (top flange +h/2, bottom −h/2). */
	zg: number;
	/** Terms of each sine series (default 12; more terms change C1 by < 0.05 %). */
	terms?: number;
}

/** Mcr with the factor it came from. */
export interface CriticalMoment {
	/** Elastic critical moment, N·mm (the largest |M| in the segment at buckling). */
	mcr: number;
	/** Factor on the segment's moment diagram and loads at buckling. */
	factor: number;
	/** Largest |M| in the segment under the given loads, N·mm. */
	mMax: number;
}

const GAUSS4 = [
	[-0.8611363115940526, 0.3478548451374538],
	[-0.3399810435848563, 0.6521451548625461],
	[0.3399810435848563, 0.6521451548625461],
	[0.8611363115940526, 0.3478548451374538]
] as const;

/**
 * Elastic critical moment of a segment.
 * @returns null when the segment carries no moment (nothing can buckle)
 * @example
 * // 305x165x40 UB, 6 m, uniform moment: ≈ 96.9e6 N·mm (Timoshenko & Gere closed form)
 * computeCriticalMoment({ segment: { length: 6000, momentStart: 1e6, momentEnd: 1e6, loads: [] },
 *   EIz: 210e3 * 764e4, GIt: 81e3 * 14.7e4, EIw: 210e3 * 0.164e12, zg: 0 })?.mcr
 */
export function computeCriticalMoment(input: CriticalMomentInput): CriticalMoment | null {
	const { segment, ...rest } = input;
	return prepareCriticalMoment({ ...rest, parts: [segment] }).at([1]);
}

/** Inputs of {@link prepareCriticalMoment}: parts of one segment whose sum is the loading. */
export interface CriticalMomentParts extends Omit<CriticalMomentInput, 'segment'> {
	/** Loadings of the same segment (same length); the buckling state is Σ wᵢ·partᵢ. */
	parts: LtbSegment[];
	/**
	 * Largest eigenvalue of a symmetric matrix given by its lower triangle, as
	 * `computeLargestEigenvalue` reads it (tests pass the full Jacobi solve to compare).
	 */
	largestEigenvalue?: (a: Float64Array, n: number) => number;
	/**
	 * Matrices already assembled, by stiffness, quadrature grid and loading (runs on the same beam
	 * that differ only in the proposed load share most of them: the governing curve).
	 */
	memo?: Map<string, Float64Array>;
}

/** Mcr of any weighted sum of the prepared parts. */
export interface PreparedCriticalMoment {
	at(weights: number[]): CriticalMoment | null;
	/**
	 * Largest |M| of a weighted sum and the largest eigenvalue μ of its scaled energy matrix
	 * (1/λcr when positive); μ is NaN when there is no moment (no solve is made).
	 */
	solve(weights: number[]): { mMax: number; mu: number };
	/** Largest |M| of a weighted sum (as `solve` finds it, without the eigenvalue). */
	peak(weights: number[]): number;
	/**
	 * A value derived from this segment's matrices alone, made once per memo (or made here when
	 * there is none): `name` must say everything it depends on besides stiffness and grid.
	 */
	remember(name: string, make: () => Float64Array): Float64Array;
	/** Largest eigenvalue of the scaled energy matrix of another loading of the same segment. */
	largestOf(segment: LtbSegment): number;
	/** Scaled energy matrix of another loading of the segment (row-major, 2N × 2N; not to be changed). */
	matrixOf(segment: LtbSegment): Float64Array;
	/** Largest eigenvalue of a matrix of that size. */
	largestOfMatrix(g: Float64Array): number;
	/** Each part's scaled energy matrix (not to be changed). */
	partMatrices: Float64Array[];
	/** Frobenius norm of each part's scaled energy matrix (bounds its eigenvalues). */
	partNorms: number[];
}

/**
 * Assembles the energy matrices of each part once; moments and load-height terms are linear in
 * the loads, so any weighted sum (fixed loads + t × temporary loads) costs one solve for the
 * largest eigenvalue.
 */
export function prepareCriticalMoment(input: CriticalMomentParts): PreparedCriticalMoment {
	const { parts, EIz, GIt, EIw, zg } = input;
	const N = input.terms ?? 12;
	const largest = input.largestEigenvalue ?? computeLargestEigenvalue;
	const L = parts[0].length;
	const k = Array.from({ length: N }, (_, i) => ((i + 1) * Math.PI) / L);
	// Diagonal stiffness (orthogonality of sines: ∫ sₘsₙ = L/2 δₘₙ).
	const d = [
		...k.map((kn) => (EIz * kn ** 4 * L) / 2),
		...k.map((kn) => ((GIt * kn ** 2 + EIw * kn ** 4) * L) / 2)
	];
	const n2 = 2 * N;
	// Each loading is integrated on its own grid (its own kinks), so a part's matrix does not
	// change when another group's loads move. The sines at its points are made once per grid.
	const grids = new Map<string, Grid>();
	const gridOf = (seg: LtbSegment): Grid => {
		const edges = listSubintervalEdges(seg, N);
		const key = edges.join(' ');
		let g = grids.get(key);
		if (!g) grids.set(key, (g = tabulateGrid(edges, k)));
		return g;
	};
	// Inverse square roots of the diagonal, for the symmetric scaling D^-½ G D^-½.
	const scale = Float64Array.from(d, (v) => 1 / Math.sqrt(v));
	const assemble = (seg: LtbSegment) => {
		// Both blocks are sums over the points of a weight times sₚ·sₚᵀ (s = the sines there):
		// the moment term with the a-terms' kᵢ² taken out of the sum, and the load-height term.
		// Each is symmetric before that factor, so one triangle of each is summed.
		const c = new Float64Array(N * N);
		const h = new Float64Array(N * N);
		const { x, w, sines } = gridOf(seg);
		for (let q = 0, at = 0; q < x.length; q++, at += N) {
			// vᵀGv = −2∫M u''φ: u'' brings −kᵢ² on the a-terms.
			const a = w[q] * computeSegmentMoment(seg, x[q]);
			const q0 = zg === 0 ? 0 : loadAt(seg, x[q]);
			const b = w[q] * q0 * zg;
			if (a === 0 && b === 0) continue;
			for (let i = 0; i < N; i++) {
				const si = sines[at + i];
				const ai = a * si;
				const bi = b * si;
				for (let j = i, e = i * N + i; j < N; j++, e++) {
					const sj = sines[at + j];
					c[e] += ai * sj;
					h[e] += bi * sj;
				}
			}
		}
		for (const load of seg.loads) {
			if (zg === 0 || load.kind !== 'point') continue;
			const s = tabulateSines(k[0], load.x, N);
			const b = load.value * zg;
			for (let i = 0; i < N; i++) {
				for (let j = i; j < N; j++) h[i * N + j] += b * s[i] * s[j];
			}
		}
		// The moment block gets kᵢ² on its rows: mirror its triangle first.
		for (let i = 0; i < N; i++) {
			for (let j = 0; j < i; j++) c[i * N + j] = c[j * N + i];
		}
		for (let i = 0; i < N; i++) {
			const k2 = k[i] ** 2;
			for (let j = 0; j < N; j++) c[i * N + j] *= k2;
		}
		// Symmetric form D^-½ G D^-½; its largest eigenvalue μ is 1/λcr.
		const g = new Float64Array(n2 * n2);
		for (let i = 0; i < N; i++) {
			for (let j = 0; j < N; j++) {
				const v = c[i * N + j] * scale[i] * scale[N + j];
				g[i * n2 + N + j] = v;
				g[(N + j) * n2 + i] = v;
				if (j >= i) {
					const w = h[i * N + j] * scale[N + i] * scale[N + j];
					g[(N + i) * n2 + N + j] = w;
					g[(N + j) * n2 + N + i] = w;
				}
			}
		}
		return g;
	};
	// The same inputs give the same matrix to the last bit, so a kept one is as good as new.
	const stiffness = input.memo ? JSON.stringify([EIz, GIt, EIw, zg, N, L]) : '';
	const kept = (seg: LtbSegment) => {
		if (!input.memo) return assemble(seg);
		const key = `${stiffness}|${JSON.stringify(seg.loads)}|${seg.momentStart}|${seg.momentEnd}`;
		let g = input.memo.get(key);
		if (!g) input.memo.set(key, (g = assemble(seg)));
		return g;
	};
	let units: [Float64Array, Float64Array] | null = null;
	const unitMatrices = () =>
		(units ??= [
			kept({ length: L, momentStart: 1, momentEnd: 0, loads: [] }),
			kept({ length: L, momentStart: 0, momentEnd: 1, loads: [] })
		]);
	const matrixOf = (seg: LtbSegment) => {
		if (seg.loads.length > 0) return kept(seg);
		// No load inside: the moment is straight between the ends, so the matrix is that of a unit
		// moment at each end, weighted (most load groups act on a segment only through its ends).
		const [start, end] = unitMatrices();
		const g = new Float64Array(start.length);
		for (let e = 0; e < g.length; e++) g[e] = seg.momentStart * start[e] + seg.momentEnd * end[e];
		return g;
	};
	const remember = (name: string, make: () => Float64Array) => {
		if (!input.memo) return make();
		const key = `${stiffness}|${name}`;
		let v = input.memo.get(key);
		if (!v) input.memo.set(key, (v = make()));
		return v;
	};
	const peak = prepareSegmentPeak(parts);
	// Parts with loads inside keep their own matrix; the others enter only through the unit
	// end-moment matrices, with their weighted end moments summed first.
	const loaded = parts.flatMap((p, i) => (p.loads.length > 0 ? [i] : []));
	const loadedMatrices = loaded.map((i) => kept(parts[i]));
	const unloaded = parts.flatMap((p, i) => (p.loads.length > 0 ? [] : [i]));
	// One buffer for the weighted sum: the solver copies what it changes. The a–a block is
	// always zero and the rest symmetric, so only the lower triangle is summed, row by row: each
	// b-row's a–b part, then its b–b part up to the diagonal. The solver reads no more.
	const sum = new Float64Array(n2 * n2);
	const addTerms = (w: number, a: Float64Array) => {
		for (let r = 0; r < N; r++) {
			for (let e = (N + r) * n2, end = e + N + r + 1; e < end; e++) sum[e] += w * a[e];
		}
	};
	const solve = (weights: number[]) => {
		const mMax = peak(weights);
		if (!(mMax > 0)) return { mMax, mu: NaN };
		for (let r = 0; r < N; r++) sum.fill(0, (N + r) * n2, (N + r) * n2 + N + r + 1);
		loaded.forEach((p, i) => {
			if (weights[p] !== 0) addTerms(weights[p], loadedMatrices[i]);
		});
		let a = 0;
		let b = 0;
		for (const p of unloaded) {
			a += weights[p] * parts[p].momentStart;
			b += weights[p] * parts[p].momentEnd;
		}
		if (a !== 0 || b !== 0) {
			const [start, end] = unitMatrices();
			if (a !== 0) addTerms(a, start);
			if (b !== 0) addTerms(b, end);
		}
		return { mMax, mu: largest(sum, n2) };
	};
	let partMatrices: Float64Array[] | null = null;
	let partNorms: number[] | null = null;
	return {
		peak,
		remember,
		solve,
		at(weights) {
			const { mMax, mu } = solve(weights);
			if (!(mMax > 0) || !(mu > 0)) return null;
			const factor = 1 / mu;
			return { mcr: factor * mMax, factor, mMax };
		},
		largestOf: (segment) => largest(matrixOf(segment), n2),
		matrixOf,
		largestOfMatrix: (g) => largest(g, n2),
		get partMatrices() {
			return (partMatrices ??= parts.map(matrixOf));
		},
		get partNorms() {
			return (partNorms ??= this.partMatrices.map(frobeniusNorm));
		}
	};
}

/** Quadrature points of one grid (positions, weights) with the sines at each, point by point. */
interface Grid {
	x: Float64Array;
	w: Float64Array;
	/** sin(kᵢ·xₚ) at index p·N + i. */
	sines: Float64Array;
}

function tabulateGrid(edges: number[], k: number[]): Grid {
	const N = k.length;
	const points = listQuadraturePoints(edges);
	const x = Float64Array.from(points, (p) => p.x);
	const w = Float64Array.from(points, (p) => p.w);
	const sines = new Float64Array(points.length * N);
	points.forEach((p, q) => sines.set(tabulateSines(k[0], p.x, N), q * N));
	return { x, w, sines };
}

/**
 * sin(n·k₁·x) for n = 1…N by the recurrence sin((n+1)θ) = 2cos θ·sin(nθ) − sin((n−1)θ): one
 * sine and one cosine per point instead of N sines (round-off grows only about as n).
 */
function tabulateSines(k1: number, x: number, N: number): Float64Array {
	const s = new Float64Array(N);
	const theta = k1 * x;
	const twoCos = 2 * Math.cos(theta);
	s[0] = Math.sin(theta);
	if (N > 1) s[1] = twoCos * s[0];
	for (let n = 2; n < N; n++) s[n] = twoCos * s[n - 1] - s[n - 2];
	return s;
}

interface QuadraturePoint {
	x: number;
	w: number;
}

/**
 * Edges of the quadrature subintervals: every load edge and point load (where the moment has a
 * kink or its peak), subdivided so each piece is at most L/(4N) long.
 */
function listSubintervalEdges(seg: LtbSegment, N: number): number[] {
	const L = seg.length;
	const breaks = new Set<number>([0, L]);
	for (const l of seg.loads) {
		if (l.kind === 'point') breaks.add(l.x);
		else {
			breaks.add(l.from);
			breaks.add(l.to);
		}
	}
	const edges = [...breaks].filter((x) => x >= 0 && x <= L).sort((a, b) => a - b);
	const out = [0];
	for (let e = 1; e < edges.length; e++) {
		const span = edges[e] - edges[e - 1];
		if (span <= 0) continue;
		const parts = Math.ceil(span / (L / (4 * N)));
		for (let p = 1; p <= parts; p++) out.push(edges[e - 1] + (span * p) / parts);
	}
	return out;
}

/** Composite 4-point Gauss rule on the subintervals. */
function listQuadraturePoints(edges: number[]): QuadraturePoint[] {
	const out: QuadraturePoint[] = [];
	for (let e = 1; e < edges.length; e++) {
		const a = edges[e - 1];
		const h = edges[e] - a;
		for (const [t, w] of GAUSS4) out.push({ x: a + ((t + 1) * h) / 2, w: (w * h) / 2 });
	}
	return out;
}

function loadAt(seg: LtbSegment, x: number): number {
	let q = 0;
	for (const l of seg.loads) {
		if (l.kind === 'line' && x >= l.from && x <= l.to) q += lineLoadAt(l, x);
	}
	return q;
}

/** √Σ g², without spreading hundreds of entries into Math.hypot (the scaled entries are small). */
function frobeniusNorm(g: Float64Array): number {
	let sum = 0;
	for (let e = 0; e < g.length; e++) sum += g[e] * g[e];
	return Math.sqrt(sum);
}
