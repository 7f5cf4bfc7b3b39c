import type { CaseFile } from './case-file';
import type { CheckOutcome } from './check-outcome';
import type { EngineReply } from './engine.worker';
import { runCheck, toCheckOutcome } from './run-check';

/**
 * Runs checks in a Web Worker (the engine can take a few hundred milliseconds on a multi-span
 * beam, which would freeze the form on a phone). Where workers are not available it runs the
 * engine on the page instead, loaded on demand.
 */
export class EngineRunner {
	#worker: Worker | null = null;
	#seq = 0;
	#waiting = new Map<number, (outcome: CheckOutcome) => void>();

	constructor() {
		try {
			this.#worker = new Worker(new URL('./engine.worker.ts', import.meta.url), { type: 'module' });
			this.#worker.onmessage = (event: MessageEvent<EngineReply>) => this.#settle(event.data);
			this.#worker.onerror = () => this.#fallBack();
		} catch {
			this.#worker = null;
		}
	}

	/** Checks one plain (snapshot) case. */
	run(c: CaseFile): Promise<CheckOutcome> {
		const seq = ++this.#seq;
		if (!this.#worker) return this.#runHere(c);
		return new Promise((resolve) => {
			this.#waiting.set(seq, resolve);
			this.#worker!.postMessage({ seq, json: c });
		});
	}

	dispose(): void {
		this.#worker?.terminate();
		this.#worker = null;
	}

	#settle(reply: EngineReply): void {
		const resolve = this.#waiting.get(reply.seq);
		this.#waiting.delete(reply.seq);
		if (!resolve) return;
		if ('error' in reply) resolve({ state: 'error', message: reply.error });
		else resolve(toCheckOutcome(reply.result));
	}

	// A worker that fails to start: answer what is waiting on the page, and stay on the page.
	#fallBack(): void {
		this.#worker?.terminate();
		this.#worker = null;
		const waiting = [...this.#waiting.values()];
		this.#waiting.clear();
		for (const resolve of waiting) resolve({ state: 'error', message: 'The engine could not start. Reload the page.' });
	}

	async #runHere(c: CaseFile): Promise<CheckOutcome> {
		const { checkCase } = await import('$lib/engine');
		return runCheck(checkCase, c);
	}
}
