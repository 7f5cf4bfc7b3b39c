/** The parts of a service worker the hand-over reads (a fake stands in for it in unit tests). */
export interface WorkerLike {
	readonly state: string;
	postMessage(message: unknown): void;
	addEventListener(type: 'statechange', listener: () => void): void;
	removeEventListener(type: 'statechange', listener: () => void): void;
}

/** The parts of `navigator.serviceWorker` the hand-over reads. */
export interface ContainerLike {
	addEventListener(type: 'controllerchange', listener: () => void): void;
	removeEventListener(type: 'controllerchange', listener: () => void): void;
}

/** How the hand-over ended: the page may reload in every case. */
export type HandOver = 'none' | 'activated' | 'redundant' | 'timeout';

/** The message the generated worker answers with `skipWaiting()`. */
export const SKIP_WAITING = { type: 'SKIP_WAITING' } as const;

/**
 * Asks the waiting worker to take over and resolves once it is fully active, or has been replaced
 * (redundant), or after `limit` ms. Only then may the page reload: a reload sent while the old
 * worker is being retired can stall for good in Chromium (seen in about one run in four).
 * Listeners go on before the message is posted, so a fast hand-over cannot be missed.
 */
export function takeWaitingWorker(
	waiting: WorkerLike | null | undefined,
	container: ContainerLike,
	limit = 5000
): Promise<HandOver> {
	if (!waiting) return Promise.resolve('none');
	return new Promise((resolve) => {
		let done = false;
		// The fallback fires long after `finish` below exists.
		const timer = setTimeout(() => finish('timeout'), limit);
		const finish = (how: HandOver) => {
			if (done) return;
			done = true;
			clearTimeout(timer);
			waiting.removeEventListener('statechange', look);
			container.removeEventListener('controllerchange', look);
			resolve(how);
		};
		// 'activating' is not enough: navigations then wait on the activate handler.
		function look(): void {
			if (waiting!.state === 'activated') finish('activated');
			else if (waiting!.state === 'redundant') finish('redundant');
		}
		waiting.addEventListener('statechange', look);
		container.addEventListener('controllerchange', look);
		waiting.postMessage(SKIP_WAITING);
		// Another tab may have finished the hand-over already.
		look();
	});
}
