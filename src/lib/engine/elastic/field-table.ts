/**
 * Readings of an element with many loads. Between neighbouring load positions the line load is
 * linear, so the state at any point follows from the state at the position before it by the
 * same statics and double integration as `readElement` (Taylor expansion with the load's
 * integral): a table of states at the positions, built once per element in one sweep, makes
 * every reading constant-time instead of a sum over all loads.
 *   V(b + u) = V − ∫q,  M(b + u) = M + V·u − ∫q·(u − τ),
 *   φ = ∫M/EI and ψ = ∫φ move on the same way with (u − τ)²/2 and (u − τ)³/6.
 */
import type { ElementData, LocalState } from './element-field';
import type { Side } from './types';

interface FieldTable {
	/** Sorted positions: 0, L and every load end or point. */
	at: number[];
	/** State just right of each position (point loads there passed). */
	V: Float64Array;
	M: Float64Array;
	phi: Float64Array;
	psi: Float64Array;
	/** Line load on the interval after each position: intensity at its start and its slope. */
	q0: Float64Array;
	dq: Float64Array;
	/** Point loads at each position. */
	P: Float64Array;
}

const tables = new WeakMap<ElementData, FieldTable>();

/** State at local position s, as `readElement` (which hands elements with many loads here). */
export function readByTable(el: ElementData, s: number, side: Side): LocalState {
	let table = tables.get(el);
	if (!table) tables.set(el, (table = buildTable(el)));
	const { at } = table;
	// Last position before s ('right' also takes a position equal to s, its point loads passed).
	let lo = 0;
	let hi = at.length - 1;
	while (lo < hi) {
		const mid = (lo + hi + 1) >> 1;
		if (at[mid] < s || (side === 'right' && at[mid] === s)) lo = mid;
		else hi = mid - 1;
	}
	const k = lo;
	const u = s - at[k];
	const st = advance(table, k, u, el.EI);
	// Left of the first position: a point load standing there is not passed yet.
	if (side === 'left' && s === at[0]) st.V += table.P[0];
	const [v1, t1] = el.displacements;
	return { V: st.V, M: st.M, w: -(v1 + t1 * s + st.psi), slope: -(t1 + st.phi) };
}

/** State at distance u past position k (u within the interval after it). */
function advance(t: FieldTable, k: number, u: number, EI: number) {
	const a = t.q0[k];
	const c = t.dq[k];
	const V = t.V[k];
	const M = t.M[k];
	// ∫₀ᵘ (a + cτ)(u − τ)ⁿ/n! dτ = a·uⁿ⁺¹/(n+1)! + c·uⁿ⁺²/(n+2)!
	const u2 = u * u;
	const u3 = u2 * u;
	const u4 = u3 * u;
	const u5 = u4 * u;
	const i0 = a * u + (c * u2) / 2;
	const i1 = (a * u2) / 2 + (c * u3) / 6;
	const i2 = (a * u3) / 6 + (c * u4) / 24;
	const i3 = (a * u4) / 24 + (c * u5) / 120;
	return {
		V: V - i0,
		M: M + V * u - i1,
		phi: t.phi[k] + (M * u + (V * u2) / 2 - i2) / EI,
		psi: t.psi[k] + t.phi[k] * u + ((M * u2) / 2 + (V * u3) / 6 - i3) / EI
	};
}

function buildTable(el: ElementData): FieldTable {
	const xs = new Set<number>([0, el.L]);
	for (const l of el.loads) {
		xs.add(l.a);
		if (l.kind === 'line') xs.add(l.b);
	}
	const at = [...xs].filter((x) => x >= 0 && x <= el.L).sort((a, b) => a - b);
	const n = at.length;
	const index = new Map(at.map((x, i) => [x, i]));
	const q0 = new Float64Array(n);
	const dq = new Float64Array(n);
	const P = new Float64Array(n);
	for (const l of el.loads) {
		if (l.kind === 'point') {
			const i = index.get(l.a);
			if (i !== undefined) P[i] += l.P;
			continue;
		}
		if (!(l.b > l.a)) continue;
		// A load a hair long carries nothing: keep its slope finite.
		const raw = (l.wb - l.wa) / (l.b - l.a);
		const slope = Number.isFinite(raw) ? raw : 0;
		for (let i = index.get(l.a) ?? n; i < n - 1 && at[i] < l.b; i++) {
			q0[i] += l.wa + slope * (at[i] - l.a);
			dq[i] += slope;
		}
	}
	const [F1, M1] = el.forces;
	const t: FieldTable = {
		at,
		V: new Float64Array(n),
		M: new Float64Array(n),
		phi: new Float64Array(n),
		psi: new Float64Array(n),
		q0,
		dq,
		P
	};
	// At s = 0 (a point load there passed on the right side).
	t.V[0] = F1 - P[0];
	t.M[0] = -M1;
	for (let k = 1; k < n; k++) {
		const st = advance(t, k - 1, at[k] - at[k - 1], el.EI);
		t.V[k] = st.V - P[k];
		t.M[k] = st.M;
		t.phi[k] = st.phi;
		t.psi[k] = st.psi;
	}
	return t;
}
