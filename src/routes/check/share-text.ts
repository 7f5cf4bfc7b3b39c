import { ENGINEER_NOTICE_SHORT } from '$lib/engine/notice';
import type { ReportView } from '$lib/ui/state/check-outcome';

const VERDICT_WORDS = { pass: 'PASS', fail: 'FAIL', 'outside-scope': 'OUTSIDE SCOPE' } as const;

/** The verdict in capitals, or NO VERDICT when no proposed load was entered. */
export function verdictWord(verdict: ReportView['answer']['verdict']): string {
	return verdict === null ? 'NO VERDICT' : VERDICT_WORDS[verdict];
}

/**
 * The short and long texts to share: the engine's own summary when it gives one, always ending
 * with the engineer-of-record notice; otherwise a plain line with the verdict and λ.
 * @example
 * composeShareTexts(report, 'Plant room beam').short // '…PASS…Screening aid only…'
 */
export function composeShareTexts(
	report: ReportView,
	title: string,
	context: { place?: string; date: string; by?: string } = { date: '' }
): { short: string; long: string } {
	const fallback = [
		title || 'Beam check',
		`Verdict: ${verdictWord(report.answer.verdict)}`,
		report.answer.message
	].join('\n');
	// Place, date and who checked it are not the engine's business: they head the text here.
	const header = [
		context.place ? `Place: ${context.place}` : '',
		context.date ? `Date: ${context.date}` : '',
		context.by ? `By: ${context.by}` : ''
	]
		.filter(Boolean)
		.join('\n');
	const join = (body: string) => (header ? `${header}\n${body}` : body);
	// An empty summary is never sent: the verdict line stands in for it.
	const short = withNotice(join(report.summary.short || fallback));
	const long = withNotice(join(report.summary.long || fallback));
	return { short, long };
}

function withNotice(text: string): string {
	return text.includes(ENGINEER_NOTICE_SHORT) ? text : `${text}\n${ENGINEER_NOTICE_SHORT}`;
}
