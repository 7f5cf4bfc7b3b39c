/**
 * A problem found in the input. Validation collects these instead of throwing, so a form can show
 * every message next to its field and nothing the user typed is lost.
 */
export interface InputIssue {
	/** Path of the field in the case, e.g. `beam.spans[1]` or `loads[0].x`. */
	path: string;
	/** Plain-language message for the person on site. */
	message: string;
	/** Stable machine code, e.g. `span-not-positive`. */
	code: string;
	severity: 'error' | 'warning';
}

export type Checked<T> =
	{ ok: true; value: T; warnings: InputIssue[] } | { ok: false; issues: InputIssue[] };

/**
 * Throws when a number that is about to enter a result is not finite: a broken invariant,
 * never a user error (those are InputIssues).
 */
export function assertFinite(value: number, what: string): number {
	if (!Number.isFinite(value)) throw new Error(`invariant: ${what} must be finite, got ${value}`);
	return value;
}
