/**
 * Test helpers: collapse problems written in kN, m and kN·m (as textbooks state them) and
 * converted to the engine's units at this edge.
 */
import { kNmToNmm, kNToN, mToMm } from '../../../src/lib/engine/units';
import type { CollapseProblem } from '../../../src/lib/engine/collapse';
import type {
	CapacitySegment,
	JointKind,
	Load,
	SupportKind
} from '../../../src/lib/engine/model/types';

/** A load in textbook units: point P (kN) at x (m), uniform w (kN/m), linear w1→w2 (kN/m). */
export type LoadSpec =
	| { P: number; at: number }
	| { w: number; from: number; to: number }
	| { w1: number; w2: number; from: number; to: number };

/** Converts a textbook load to an engine load. */
export function toLoad(spec: LoadSpec, action: Load['action'] = 'temporary'): Load {
	if ('P' in spec) return { kind: 'point', x: mToMm(spec.at), value: kNToN(spec.P), action };
	if ('w' in spec)
		return { kind: 'uniform', from: mToMm(spec.from), to: mToMm(spec.to), value: spec.w, action };
	return {
		kind: 'linear',
		from: mToMm(spec.from),
		to: mToMm(spec.to),
		start: spec.w1,
		end: spec.w2,
		action
	};
}

/** Options of `makeProblem`, in m, kN and kN·m. */
export interface ProblemSpec {
	spans: number[];
	supports: SupportKind[];
	joints?: JointKind[];
	/** One Mp for the whole beam, one per span, or explicit segments { from, to, sag, hog } in m, kN·m. */
	Mp: number | number[] | { from: number; to: number; sag: number; hog: number }[];
	fixed?: LoadSpec[];
	variable: LoadSpec[];
}

/** Builds an engine collapse problem from a textbook description. */
export function makeProblem(spec: ProblemSpec): CollapseProblem {
	const joints = spec.joints ?? spec.spans.slice(1).map((): JointKind => 'continuous');
	let capacity: CapacitySegment[];
	if (typeof spec.Mp === 'number') {
		const L = spec.spans.reduce((a, b) => a + b, 0);
		capacity = [{ from: 0, to: mToMm(L), sagging: kNmToNmm(spec.Mp), hogging: kNmToNmm(spec.Mp) }];
	} else if (typeof spec.Mp[0] === 'number') {
		let x = 0;
		capacity = (spec.Mp as number[]).map((m, i) => {
			const seg = {
				from: mToMm(x),
				to: mToMm(x + spec.spans[i]),
				sagging: kNmToNmm(m),
				hogging: kNmToNmm(m)
			};
			x += spec.spans[i];
			return seg;
		});
	} else {
		capacity = (spec.Mp as { from: number; to: number; sag: number; hog: number }[]).map((s) => ({
			from: mToMm(s.from),
			to: mToMm(s.to),
			sagging: kNmToNmm(s.sag),
			hogging: kNmToNmm(s.hog)
		}));
	}
	return {
		beam: { spans: spec.spans.map(mToMm), supports: spec.supports, joints },
		capacity,
		fixedLoads: (spec.fixed ?? []).map((l) => toLoad(l, 'permanent')),
		variableLoads: spec.variable.map((l) => toLoad(l))
	};
}

/** Relative difference |a − b| / |b|. */
export function relativeError(actual: number, expected: number): number {
	return Math.abs(actual - expected) / Math.abs(expected);
}
