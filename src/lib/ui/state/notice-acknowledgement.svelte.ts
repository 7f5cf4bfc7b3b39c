const KEY = 'hingepoint.notice-acknowledged.v1';

/**
 * Whether the person has acknowledged the engineer-of-record notice on this device. Stored in
 * localStorage (a tiny flag; losing it only shows the notice again, which is safe).
 */
export class NoticeAcknowledgement {
	acknowledged = $state(true);
	loaded = $state(false);

	load(): void {
		this.acknowledged = readFlag();
		this.loaded = true;
	}

	acknowledge(): void {
		this.acknowledged = true;
		try {
			// eslint-disable-next-line svelte/prefer-svelte-reactivity -- a one-off timestamp, not state
			localStorage.setItem(KEY, new Date().toISOString());
		} catch {
			// Storage blocked: the notice will simply show again next time.
		}
	}
}

function readFlag(): boolean {
	try {
		return localStorage.getItem(KEY) !== null;
	} catch {
		return false;
	}
}

export const noticeAcknowledgement = new NoticeAcknowledgement();
