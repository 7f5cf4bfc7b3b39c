/**
 * Moment and shear of an arrangement at a fixed list of points, summed once per arrangement from
 * the groups' effects there (elastic effects are linear in the group weights). A check that
 * tries many multipliers on many arrangements then reads arrays instead of summing the groups
 * again at every trial. The sums run in the order of `LoadEffects.fixedAt` / `variableAt`, so
 * the values are the same to the last bit.
 */
import type { Side } from '../elastic/index';
import type { LoadArrangement } from './load-arrangements';
import type { LoadEffects } from './load-effects';

/** Per point (same order as the list): fixed-load and temporary-load M (N·mm) and V (N). */
export interface PointEffects {
	fixedM: Float64Array;
	fixedV: Float64Array;
	variableM: Float64Array;
	variableV: Float64Array;
}

/**
 * A reader of each arrangement's effects at the points, built on first use and kept.
 * @example
 * const read = preparePointEffects(ctx.effects, [{ x: 3000, side: 'left' }]);
 * read(arrangement).fixedM[0] + t * read(arrangement).variableM[0] // M at x = 3 m, N·mm
 */
export function preparePointEffects(
	effects: LoadEffects,
	points: { x: number; side: Side }[]
): (arrangement: LoadArrangement) => PointEffects {
	const n = points.length;
	const groups = effects.groups.map((g) => ({
		g,
		temporary: g.kind === 'temporary',
		M: Float64Array.from(points, (p) => g.at(p.x, p.side).M),
		V: Float64Array.from(points, (p) => g.at(p.x, p.side).V)
	}));
	const known = new Map<LoadArrangement, PointEffects>();
	return (arrangement) => {
		let e = known.get(arrangement);
		if (e) return e;
		e = {
			fixedM: new Float64Array(n),
			fixedV: new Float64Array(n),
			variableM: new Float64Array(n),
			variableV: new Float64Array(n)
		};
		for (const { g, temporary, M, V } of groups) {
			const w = g.weight(arrangement);
			if (w === 0) continue;
			const toM = temporary ? e.variableM : e.fixedM;
			const toV = temporary ? e.variableV : e.fixedV;
			for (let i = 0; i < n; i++) {
				toM[i] += w * M[i];
				toV[i] += w * V[i];
			}
		}
		known.set(arrangement, e);
		return e;
	};
}
