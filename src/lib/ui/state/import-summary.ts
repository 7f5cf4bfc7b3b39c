import type { ImportResult } from '$lib/storage';

/**
 * One plain paragraph saying what an import did, shown beside the import control.
 * @example
 * describeImport({ ok: true, added: 2, beside: 1, skipped: 2, attention: 0 })
 * // 'Added 3 checks, 1 kept beside an existing one with the same id, 2 already here.'
 */
export function describeImport(result: ImportResult): string {
	if (!result.ok) return `Backup refused, nothing changed: ${result.message}`;
	const total = result.added + result.beside;
	const parts = [total === 0 ? 'Nothing added' : `Added ${plural(total, 'check')}`];
	if (result.beside > 0)
		parts.push(`${result.beside} kept beside an existing one with the same id`);
	if (result.skipped > 0) parts.push(`${result.skipped} already here`);
	let text = `${parts.join(', ')}.`;
	if (result.attention > 0) {
		const verb = result.attention === 1 ? 'needs' : 'need';
		text += ` ${plural(result.attention, 'check')} ${verb} attention: the inputs did not pass validation, so no verdict is shown.`;
	}
	return text;
}

function plural(n: number, word: string): string {
	return `${n} ${word}${n === 1 ? '' : 's'}`;
}
