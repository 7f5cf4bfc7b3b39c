/**
 * Hands a finished file to the user: the share sheet where the browser can share files (so it
 * goes straight to mail or a messenger), a download otherwise.
 */

/** What happened to the file. */
export type Delivery = 'shared' | 'downloaded' | 'cancelled';

export async function deliverFile(file: File): Promise<Delivery> {
	const data = { files: [file], title: file.name };
	if (typeof navigator.canShare === 'function' && navigator.canShare({ files: [file] })) {
		try {
			await navigator.share(data);
			return 'shared';
		} catch (error) {
			// The person closed the share sheet: they chose not to send it.
			if (error instanceof DOMException && error.name === 'AbortError') return 'cancelled';
		}
	}
	const a = document.createElement('a');
	a.href = URL.createObjectURL(file);
	a.download = file.name;
	document.body.append(a);
	a.click();
	a.remove();
	// Revoked later: some browsers read the file after click() returns.
	setTimeout(() => URL.revokeObjectURL(a.href), 10_000);
	return 'downloaded';
}

/** A file name from the check's title and the date, e.g. `calc-sheet-hoist-beam.pdf`. */
export function sheetFileName(title: string): string {
	const slug = title
		.toLowerCase()
		.replace(/[^a-z0-9]+/g, '-')
		.replace(/^-|-$/g, '')
		.slice(0, 60);
	return `calc-sheet${slug ? `-${slug}` : ''}.pdf`;
}
