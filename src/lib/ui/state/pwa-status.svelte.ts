import { useRegisterSW } from 'virtual:pwa-register/svelte';

/**
 * Service-worker state for the shell: whether a new version waits for the user's tap, and whether
 * the device is offline. Reloading is always the user's choice, so a half-filled form is never lost
 * to a silent update (the draft is saved on every change anyway).
 */
export class PwaStatus {
	updateReady = $state(false);
	offlineReady = $state(false);
	online = $state(true);
	/** An older copy of the app in another tab keeps the saved checks from opening. */
	storageBlocked = $state(false);
	#update: (reload?: boolean) => Promise<void> = async () => {};

	/** Starts registration; call once from the root layout on mount. */
	start(): void {
		this.online = navigator.onLine;
		addEventListener('online', () => (this.online = true));
		addEventListener('offline', () => (this.online = false));
		const { needRefresh, offlineReady, updateServiceWorker } = useRegisterSW({
			onRegisterError: (error) => console.warn('service worker registration failed', error)
		});
		needRefresh.subscribe((value) => (this.updateReady = value));
		offlineReady.subscribe((value) => (this.offlineReady = value));
		this.#update = updateServiceWorker;
	}

	/** Another part of the app (e.g. a blocked database upgrade) can ask for the update notice. */
	requestReload(): void {
		this.updateReady = true;
	}

	async applyUpdate(): Promise<void> {
		// Let listeners save the draft first: pagehide/visibilitychange fire on reload too.
		await this.#update(true);
		location.reload();
	}
}

export const pwaStatus = new PwaStatus();
