/**
 * The governing capacity curve in output units, with the stretches of beam where one check
 * governs.
 */
import type { GoverningCurve } from '../checks/governing-curve';
import { mmToM, nToKN } from '../units';
import type { CapacityCurveReport } from './types';

const LABEL =
	'Largest single proposed point load at each position (characteristic), with the existing ' +
	'loads present, over every check that decides the verdict';

/** The curve as reported; stretches join neighbouring points with the same governing check. */
export function reportCapacityCurve(curve: GoverningCurve): CapacityCurveReport {
	const points = curve.points.map((p) => ({
		x: mmToM(p.x),
		p: p.p === null ? null : nToKN(p.p),
		governing: p.governing?.id ?? null,
		outsideScope: p.outsideScope
	}));
	const stretches: CapacityCurveReport['stretches'] = [];
	for (const p of curve.points) {
		if (!p.governing) continue;
		const last = stretches[stretches.length - 1];
		const x = mmToM(p.x);
		if (last && last.governing.label === p.governing.label) last.to = x;
		else stretches.push({ from: x, to: x, governing: { ...p.governing } });
	}
	const m = curve.min;
	return {
		label: LABEL,
		points,
		stretches,
		min:
			m && m.p !== null
				? { x: mmToM(m.x), p: nToKN(m.p), governing: m.governing && { ...m.governing } }
				: null
	};
}
