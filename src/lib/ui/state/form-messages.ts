import type { CaseFile } from './case-file';
import type { CheckOutcome } from './check-outcome';
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
			if (isFieldPath(c, issue.path)) merged[issue.path] ??= issue.message;
		}
	}
	return { ...merged, ...local };
}

/** The engine's input issues that belong to no single field (shown above the result). */
export function collectGeneral(outcome: CheckOutcome | null, c: CaseFile): { path: string; message: string }[] {
	if (outcome?.state !== 'issues') return [];
	return outcome.issues.filter((issue) => !isFieldPath(c, issue.path));
}

