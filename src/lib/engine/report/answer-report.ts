/**
 * The answer in output units and in words: what the verdict means, and what each proposed load
 * may grow to ("Largest proposed load: 19.3 kN (load 3, hoist)").
 */
import type { Answer, AllowableLoad } from '../checks/answer';
import { nPerMmToKNPerM, nToKN } from '../units';
import { formatIn, type SummaryUnits } from './summary-units';
import type { AllowableLoadReport, AnswerReport } from './types';

const SCREENING = 'Within capacity for the inputs entered — screening only, not an approval.';
const NO_LOAD =
	'No proposed temporary load was entered (or every one is zero): enter the load to be added ' +
	'to get a verdict.';
const EXISTING_FAIL = 'The existing loads alone already exceed a check: ask an engineer now.';
const OUTSIDE = 'Outside the scope of this method: no capacity is given.';

/** The answer as reported; its message names loads in `units`, its numbers stay SI. */
export function reportAnswer(
	answer: Answer,
	labels: (string | null)[],
	units: SummaryUnits = 'si'
): AnswerReport {
	const allowable = answer.allowable.map((a) => reportAllowable(a, labels[a.index] ?? null));
	return {
		verdict: answer.verdict,
		message: writeMessage(answer, allowable, units),
		governing: answer.governing && { ...answer.governing },
		multiplier: answer.multiplier,
		reserve: answer.reserve,
		utilisation: answer.utilisation,
		allowable,
		reasons: [...answer.reasons]
	};
}

function reportAllowable(a: AllowableLoad, label: string | null): AllowableLoadReport {
	const point = a.kind === 'point';
	const convert = point ? nToKN : nPerMmToKNPerM;
	return {
		load: a.index,
		label,
		kind: a.kind,
		entered: convert(a.entered),
		value: a.value === null ? null : convert(a.value),
		unit: point ? 'kN' : 'kN/m',
		direction: a.direction,
		effect: a.effect
	};
}

/**
 * "19.3 kN (load 3, hoist)", "58 kN upward (load 2)", "relieves the beam (load 2)"; in US
 * customary units "4.34 kip (load 3, hoist)".
 */
export function describeAllowable(a: AllowableLoadReport, units: SummaryUnits = 'si'): string {
	const who = `load ${a.load + 1}${a.label ? `, ${a.label}` : ''}`;
	if (a.value === null) {
		const what = a.effect === 'relieves' ? 'relieves the beam' : 'not limited by any check made';
		return `${what} (${who})`;
	}
	const up = a.direction === 'up' ? ' upward' : '';
	const size = formatIn(a.value, a.unit === 'kN' ? 'force' : 'lineLoad', units);
	return `${size}${up} (${who})`;
}

/** The one sentence under the verdict. */
function writeMessage(
	answer: Answer,
	allowable: AllowableLoadReport[],
	units: SummaryUnits
): string {
	if (answer.verdict === 'outside-scope') return OUTSIDE;
	if (answer.verdict === null) return answer.existingFail ? `${NO_LOAD} ${EXISTING_FAIL}` : NO_LOAD;
	const parts = [
		answer.verdict === 'pass'
			? SCREENING
			: `Not within capacity: ${answer.governing?.label ?? 'a check'} is exceeded.`
	];
	if (answer.relievesOnly) {
		parts.push('The proposed load acts upward and relieves the beam: no deciding check limits it.');
	} else if (answer.multiplier === 0) {
		parts.push('No temporary load can be added: the existing loads already use the capacity.');
	} else if (allowable.length > 0) {
		const many = allowable.length > 1;
		const list = allowable.map((a) => describeAllowable(a, units)).join('; ');
		parts.push(`Largest proposed load${many ? 's, together' : ''}: ${list}.`);
	}
	if (answer.existingFail && answer.verdict === 'fail') parts.push(EXISTING_FAIL);
	return parts.join(' ');
}
