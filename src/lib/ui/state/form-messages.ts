import type { CaseFile } from './case-file';
import type { CheckOutcome } from './check-outcome';
import { isBlank } from './blank-value';
import { readPath } from './field-path';

// A path names a field when it leads to a single value (not a list or an object).
function isFieldPath(c: CaseFile, path: string): boolean {
	const value = readPath(c, path);
	return value !== undefined && (value === null || typeof value !== 'object');
}

/**
 * Messages by field path: what was typed wrong first, then the engine's input issues that name a
 * field of the form.
 */
export function mergeMessages(
	local: Record<string, string>,
	outcome: CheckOutcome | null,
	c: CaseFile
): Record<string, string> {
	const merged: Record<string, string> = {};
	if (outcome?.state === 'issues') {
		for (const issue of outcome.issues) {
			if (isFieldPath(c, issue.path)) merged[issue.path] ??= wordIssue(issue, c);
		}
	}
	return { ...merged, ...local };
}

/** What an empty field says: it was never filled, not that something typed is wrong. */
export const BLANK_MESSAGE = 'Not entered yet.';

function wordIssue(issue: { path: string; message: string }, c: CaseFile): string {
	return isBlank(readPath(c, issue.path)) ? BLANK_MESSAGE : issue.message;
}

/**
 * Every field to fix, in order: typing problems first, then the engine's input issues (all of
 * them, a field's or the whole check's), worded as the fields show them.
 */
export function listProblems(
	local: Record<string, string>,
	outcome: CheckOutcome | null,
	c: CaseFile
): { path: string; message: string }[] {
	const typed = Object.entries(local).map(([path, message]) => ({ path, message }));
	if (outcome?.state !== 'issues') return typed;
	return [...typed, ...outcome.issues.map((i) => ({ path: i.path, message: wordIssue(i, c) }))];
}

/** The engine's input issues that belong to no single field (shown above the result). */
export function collectGeneral(
	outcome: CheckOutcome | null,
	c: CaseFile
): { path: string; message: string }[] {
	if (outcome?.state !== 'issues') return [];
	return outcome.issues.filter((issue) => !isFieldPath(c, issue.path));
}
