import { afterEach, describe, expect, it, vi } from 'vitest';
import {
	SKIP_WAITING,
	takeWaitingWorker,
	type ContainerLike,
	type WorkerLike
} from '../../../src/lib/pwa/take-update';

/** A service worker whose state the test moves by hand, as the browser would. */
class FakeWorker extends EventTarget implements WorkerLike {
	state: string;
	sent: unknown[] = [];
	onPost: (worker: FakeWorker) => void = () => {};
	constructor(state = 'installed') {
		super();
		this.state = state;
	}
	postMessage(message: unknown): void {
		this.sent.push(message);
		this.onPost(this);
	}
	moveTo(state: string): void {
		this.state = state;
		this.dispatchEvent(new Event('statechange'));
	}
}

class FakeContainer extends EventTarget implements ContainerLike {}

/** Resolves to the outcome, or 'pending' if it has not settled after the queued callbacks ran. */
async function settled<T>(promise: Promise<T>): Promise<T | 'pending'> {
	return Promise.race([promise, new Promise<'pending'>((r) => setTimeout(() => r('pending'), 0))]);
}

afterEach(() => vi.useRealTimers());

describe('taking the waiting version', () => {
	it('asks the waiting worker to skip waiting and waits until it is activated', async () => {
		const worker = new FakeWorker();
		const container = new FakeContainer();
		const handOver = takeWaitingWorker(worker, container);
		expect(worker.sent).toEqual([SKIP_WAITING]);
		worker.moveTo('activating');
		container.dispatchEvent(new Event('controllerchange'));
		// Controlling but still activating: a reload now would wait on the activate handler.
		expect(await settled(handOver)).toBe('pending');
		worker.moveTo('activated');
		expect(await handOver).toBe('activated');
	});

	it('does not miss a hand-over that completes while the message is being posted', async () => {
		const worker = new FakeWorker();
		const container = new FakeContainer();
		worker.onPost = (w) => {
			w.moveTo('activating');
			container.dispatchEvent(new Event('controllerchange'));
			w.moveTo('activated');
		};
		expect(await settled(takeWaitingWorker(worker, container))).toBe('activated');
	});

	it('lets the page reload when the worker was already taken over by another tab', async () => {
		const gone = new FakeWorker('redundant');
		expect(await settled(takeWaitingWorker(gone, new FakeContainer()))).toBe('redundant');
		const active = new FakeWorker('activated');
		expect(await settled(takeWaitingWorker(active, new FakeContainer()))).toBe('activated');
		expect(await takeWaitingWorker(null, new FakeContainer())).toBe('none');
	});

	it('gives up waiting after the limit so a tap always reloads', async () => {
		vi.useFakeTimers();
		const worker = new FakeWorker();
		const handOver = takeWaitingWorker(worker, new FakeContainer(), 5000);
		let outcome = 'pending';
		void handOver.then((how) => (outcome = how));
		await vi.advanceTimersByTimeAsync(4999);
		expect(outcome).toBe('pending');
		await vi.advanceTimersByTimeAsync(1);
		expect(outcome).toBe('timeout');
	});

	it('stops listening once settled', async () => {
		const worker = new FakeWorker();
		const container = new FakeContainer();
		const removed = vi.spyOn(worker, 'removeEventListener');
		const removedHere = vi.spyOn(container, 'removeEventListener');
		const handOver = takeWaitingWorker(worker, container);
		worker.moveTo('activated');
		await handOver;
		expect(removed).toHaveBeenCalledWith('statechange', expect.any(Function));
		expect(removedHere).toHaveBeenCalledWith('controllerchange', expect.any(Function));
	});
});
