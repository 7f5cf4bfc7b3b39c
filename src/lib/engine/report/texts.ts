/**
 * The plain sentences of a report: notices (what needs attention) and assumptions (what the
 * result rests on). Wording is ours.
 */
import type { CaseModel } from '../case/types';
import { ENGINEER_NOTICE_SHORT } from '../notice';
import type { CollapseReport, ElasticReport } from './types';

const FAILS_UNDER_FIXED =
	'The beam fails under the existing loads alone: no temporary load can be added. ' +
	'Ask an engineer now.';
const NOT_CERTIFIED =
	'The collapse result is not certified by matching bounds. It must not be taken as acceptable.';
const ALL_LOADS = 'No temporary load was entered: the load factor applies to all loads together.';
const GRADE_DEFAULT =
	'The steel strength is a lower-bound default for unknown steel: confirm it before relying ' +
	'on the result.';
const KNOWN_MP =
	'The plastic moment was entered directly: confirm the section is Class 1 and the value ' +
	'includes any section loss.';

/** Notices, the engineer-of-record notice first. */
export function writeNotices(
	model: CaseModel,
	collapse: CollapseReport,
	elastic: ElasticReport
): string[] {
	const out = [ENGINEER_NOTICE_SHORT];
	if (collapse.status === 'fails-under-fixed') out.push(FAILS_UNDER_FIXED);
	else if (collapse.status === 'unbounded') out.push(collapse.message ?? 'No collapse load found.');
	else if (!collapse.certified) out.push(NOT_CERTIFIED);
	if (collapse.appliesTo === 'all') out.push(ALL_LOADS);
	if (model.selfWeightMissing.length > 0) {
		const spans = model.selfWeightMissing.map((e) => e + 1).join(', ');
		out.push(
			`Self-weight is not included for span(s) ${spans}: the mass is not known. ` +
				'Add it as a permanent load.'
		);
	}
	if (model.grades.some((g) => g?.needsConfirmation)) out.push(GRADE_DEFAULT);
	if (model.sections.some((s) => s.shape === 'known-mp')) out.push(KNOWN_MP);
	out.push(...elastic.notAvailable);
	return out;
}

/** Assumptions the numbers rest on. */
export function writeAssumptions(model: CaseModel): string[] {
	const f = model.factors;
	const out = [
		'Plastic collapse by simple plastic theory: ductile steel, hinges that rotate at constant ' +
			'moment, small deflections.',
		'Plastic hinges need Class 1 sections and full lateral and torsional restraint at and ' +
			'between hinges.',
		`Design loads: permanent × ${f.permanent}, imposed × ${f.imposed}, temporary × ` +
			`${f.temporary}; resistance Wpl·fy/γM0 with γM0 = ${f.gammaM0}.`,
		'Temporary loads are the ones increased by the load factor; the other loads stay at their ' +
			'design values.',
		'All loads act in the plane of the web, with no axial force and no torsion.',
		'Elastic results use E = 210 000 MPa and the major-axis second moment of area; deflections ' +
			'are under unfactored loads.',
		'Shear, bearing, buckling, connections and supports are not part of the collapse load factor.'
	];
	if (model.selfWeight) out.push('Self-weight of the section is included as a permanent load.');
	else out.push('Self-weight is not added: it is assumed to be among the entered permanent loads.');
	if (model.sectionLoss > 0) {
		out.push(`A section loss of ${model.sectionLoss} mm per exposed face is deducted.`);
	}
	return out;
}
