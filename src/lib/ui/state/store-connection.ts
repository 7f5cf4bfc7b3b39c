import { openStore, type CheckStore } from '$lib/storage/db';
import { pwaStatus } from './pwa-status.svelte';

let opening: Promise<CheckStore | null> | null = null;

/**
 * The one open saved-checks database of this page, opened on first use. Null when the browser
 * refuses storage (private mode, blocked): the screens then say so and keep working without it.
 * A newer app version waiting to upgrade closes it and asks for the reload.
 */
export function connectStore(): Promise<CheckStore | null> {
	opening ??= openStore(undefined, {
		// An older tab holds the database open; the upgrade waits until it is closed.
		onBlocked: () => (pwaStatus.storageBlocked = true),
		onStatus: (status) => {
			if (status === 'update-needed') pwaStatus.requestReload();
			// A closed or ended connection is reopened on the next use.
			if (status !== 'open') opening = null;
		}
	}).then((result) => {
		pwaStatus.storageBlocked = false;
		return result.ok ? result.store : null;
	});
	return opening;
}
