/**
 * The notice and assumptions every result carries. Wording is ours; the engineer-of-record
 * notice itself lives in ../notice.ts.
 */
import { ENGINEER_NOTICE_SHORT } from '../notice';

/** Assumptions every result rests on. */
export const BASE_ASSUMPTIONS: readonly string[] = [
	'Ductile structural steel (not cast or wrought iron).',
	'Section and steel grade as entered; dimensions measured on site.',
	'Supports, bearings, connections and what holds them up are not checked.',
	'No fatigue, vibration or dynamic effects beyond the factor used on the temporary load.',
	'Member checks use elastic moments and shears under the design loads.'
];

/**
 * Notices for a result: the engineer-of-record notice first, then the route-specific remarks.
 * @example
 * listNotices({ restraintGiven: false, hollow: false })[0] // the engineer-of-record notice
 */
export function listNotices(o: {
	restraintGiven: boolean;
	hollow: boolean;
	bearingGiven: boolean;
}): { notices: string[]; assumptions: string[] } {
	const assumptions = [...BASE_ASSUMPTIONS];
	if (!o.restraintGiven) {
		assumptions.push(
			'No lateral restraint was given: the compression flange is taken as restrained throughout.'
		);
	}
	if (!o.bearingGiven) {
		assumptions.push('No stiff bearing lengths were given: taken as 0 mm (conservative).');
	}
	const notices = [ENGINEER_NOTICE_SHORT];
	if (o.hollow) notices.push('Local web bearing is not checked for hollow or solid sections.');
	return { notices, assumptions };
}
