/**
 * The plain sentences of a report: notices (what needs attention) and assumptions (what the
 * result rests on). Wording is ours.
 */
import type { CaseModel } from '../case/types';
import type { ReportWording } from '../checks/basis-types';
import { ENGINEER_NOTICE_SHORT } from '../notice';
import { formatIn, type SummaryUnits } from './summary-units';
import type { CollapseReport } from './types';
import { describeDesignWalls } from './wall-words';

const FAILS_UNDER_FIXED =
	'The beam fails under the existing loads alone: no temporary load can be added. ' +
	'Ask an engineer now.';
const NOT_CERTIFIED =
	'The collapse result is not certified by matching bounds. It must not be taken as acceptable.';
const GRADE_DEFAULT =
	'The steel strength is a lower-bound default for unknown steel: confirm it before relying ' +
	'on the result.';
const RESTRAINT_ASSUMED =
	'No lateral restraint was given: the compression flange is taken as held only at the ' +
	'supports, with the load on the top flange (the cautious default). Give the restraint if ' +
	'the flange is held elsewhere.';
const KNOWN_MP =
	'The plastic moment was entered directly: confirm the section is Class 1 and the value ' +
	'includes any section loss.';

/**
 * Notices, the engineer-of-record notice first; `wording` gives the basis's own sentences
 * (Eurocode ones without it).
 */
export function writeNotices(
	model: CaseModel,
	collapse: CollapseReport | null,
	wording?: ReportWording
): string[] {
	const out = [ENGINEER_NOTICE_SHORT];
	if (collapse?.decides) {
		if (collapse.status === 'fails-under-fixed') out.push(FAILS_UNDER_FIXED);
		else if (collapse.status !== 'unbounded' && !collapse.certified) out.push(NOT_CERTIFIED);
	}
	if (model.selfWeightMissing.length > 0) {
		const spans = model.selfWeightMissing.map((e) => e + 1).join(', ');
		out.push(
			`Self-weight is not included for span(s) ${spans}: the mass is not known. ` +
				'Add it as a permanent load.'
		);
	}
	if (model.restraintAssumed) out.push(RESTRAINT_ASSUMED);
	if (model.grades.some((g) => g?.needsConfirmation)) out.push(GRADE_DEFAULT);
	if (model.sections.some((s) => s.shape === 'known-mp')) {
		out.push(wording?.knownMpNotice ?? KNOWN_MP);
	}
	return out;
}

/** Elastic modulus as the assumption states it: the standard's own figure in SI. */
const E_WORDS: Record<SummaryUnits, string> = {
	si: '210 000 MPa',
	us: formatIn(210_000, 'stress', 'us')
};

/**
 * Assumptions the numbers rest on, figures in `units`; `wording` gives the basis's factor,
 * modulus and hinge sentences (the Eurocode ones without it, or on that basis).
 */
export function writeAssumptions(
	model: CaseModel,
	units: SummaryUnits = 'si',
	wording?: ReportWording
): string[] {
	const f = model.factors;
	const own = wording && wording.basisId !== 'en1993' ? wording : null;
	const hinges =
		own?.plasticAssumption ??
		'hinges need Class 1 sections with lateral and torsional restraint at and near them.';
	const out = [
		'Plastic collapse (where it is the route) by simple plastic theory: ductile steel, hinges ' +
			`that rotate at constant moment, small deflections; ${hinges}`,
		own?.factors ??
			`Design loads: permanent × ${f.permanent}, imposed × ${f.imposed}, temporary × ` +
				`${f.temporary}; resistance factors γM0 = ${f.gammaM0}, γM1 = ${f.gammaM1}.`,
		'The proposed temporary loads are the ones increased by the multiplier; the other loads ' +
			'stay at their design values.',
		'All loads act in the plane of the web, with no axial force and no torsion.',
		`Elastic results use ${own?.modulus ?? `E = ${E_WORDS[units]}`} and the major-axis second moment of area; deflections ` +
			'are under unfactored loads.'
	];
	if (model.selfWeight) out.push('Self-weight of the section is included as a permanent load.');
	else out.push('Self-weight is not added: it is assumed to be among the entered permanent loads.');
	if (model.sectionLoss > 0) {
		const loss =
			units === 'si' ? `${model.sectionLoss} mm` : formatIn(model.sectionLoss, 'small', units);
		out.push(`A section loss of ${loss} per exposed face is deducted.`);
	}
	out.push(...describeDesignWalls(model, units));
	return out;
}
