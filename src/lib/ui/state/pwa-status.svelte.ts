import { useRegisterSW } from 'virtual:pwa-register/svelte';
import { takeWaitingWorker } from '$lib/pwa/take-update';

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
	/** True from the tap on the update notice until the page reloads. */
	reloading = $state(false);

	/** Starts registration; call once from the root layout on mount. */
	start(): void {
		this.online = navigator.onLine;
		addEventListener('online', () => (this.online = true));
		addEventListener('offline', () => (this.online = false));
		const { needRefresh, offlineReady } = useRegisterSW({
			onRegisterError: (error) => console.warn('service worker registration failed', error),
			// The plugin would reload at once when another tab takes the update; ask here instead.
			onNeedReload: () => {
				if (!this.reloading) this.updateReady = true;
			}
		});
		needRefresh.subscribe((value) => (this.updateReady = value));
		offlineReady.subscribe((value) => (this.offlineReady = value));
	}

	/** Another part of the app (e.g. a blocked database upgrade) can ask for the update notice. */
	requestReload(): void {
		this.updateReady = true;
	}

	/**
	 * Hands over to the waiting version, then reloads. The reload waits until the new worker is
	 * active (or gone, or 5 s passed): reloading during the hand-over could stall the page for good.
	 * Draft listeners still run: pagehide/visibilitychange fire on reload too.
	 */
	async applyUpdate(): Promise<void> {
		// A second tap would find no waiting worker and reload in the middle of the hand-over.
		if (this.reloading) return;
		this.reloading = true;
		const container = 'serviceWorker' in navigator ? navigator.serviceWorker : null;
		if (container) {
			const registration = await container.getRegistration().catch(() => undefined);
			await takeWaitingWorker(registration?.waiting, container);
		}
		location.reload();
	}
}

export const pwaStatus = new PwaStatus();
