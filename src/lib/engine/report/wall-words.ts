/**
 * Which wall a US tube was designed on, said once per tube: AISC 360-22 B4.2 takes 0.93 × the
 * nominal wall for ERW tubes (ASTM A500; A53 pipe as the AISC Manual tabulates it) and the
 * nominal wall for ASTM A1085 tubes, whose wall tolerance is tighter.
 */
import type { CaseModel } from '../case/types';
import { formatIn, type SummaryUnits } from './summary-units';

/**
 * One sentence per US HSS or pipe of the beam, figures in `units`; none for other sections.
 * @example describeDesignWalls(model, 'us')
 * // ['HSS8x6x1/2: design wall = the nominal wall 0.5 in, as AISC 360-22 B4.2 takes for ASTM A1085 tubes.']
 */
export function describeDesignWalls(
	model: Pick<CaseModel, 'sections'>,
	units: SummaryUnits
): string[] {
	const out: string[] = [];
	for (const s of new Set(model.sections)) {
		if (s.nominalWall === undefined || s.designWall === undefined) continue;
		const nominal = formatIn(s.nominalWall, 'small', units);
		const lossWords = s.loss > 0 ? ' The section loss is taken off this wall.' : '';
		const ratio = s.designWall / s.nominalWall;
		const sentence =
			Math.abs(ratio - 1) < 1e-9
				? `${s.designation}: design wall = the nominal wall ${nominal}, as AISC 360-22 B4.2 ` +
					'takes for ASTM A1085 tubes.'
				: `${s.designation}: design wall ${Number(ratio.toFixed(3))} × the nominal wall ` +
					`${nominal} = ${formatIn(s.designWall, 'small', units)}, as AISC 360-22 B4.2 takes ` +
					'for electric-resistance-welded tubes (ASTM A500; A53 pipe as the AISC Manual ' +
					'tabulates it).';
		out.push(sentence + lossWords);
	}
	return out;
}
