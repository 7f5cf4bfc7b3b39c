import type { CaseFile } from './case-file';
import type { CheckOutcome } from './check-outcome';
import type { EngineReply, EngineRequest } from './engine.worker';
import { runCheck, toCheckOutcome } from './run-check';

/** The parts of a Worker the runner uses (a fake stands in for it in unit tests). */
export interface EnginePort {
	postMessage(message: EngineRequest): void;
	terminate(): void;
	onmessage: ((event: { data: EngineReply }) => void) | null;
	onerror: ((event: { message?: string; preventDefault?: () => void }) => void) | null;
	onmessageerror: ((event: unknown) => void) | null;
}

export interface EngineRunnerOptions {
	/** Starts a worker; null (or a throw) means none can run here and checks run on the page. */
	spawn?: () => EnginePort | null;
	/** How long a running check may finish before a newer one replaces its worker, ms. */
	grace?: number;
	/** The same for a worker that has not answered yet: it may still be loading the engine. */
	coldGrace?: number;
	/** How long a check may run before it is stopped, ms. */
	limit?: number;
}

/** Given to an answer nobody waits for any more (the form shows only the latest). */
export const REPLACED: CheckOutcome = failed('A newer check replaced this one.');

// The result panel puts these after "The engine stopped … and gives no result:".

/** The message when a check runs past the limit. */
export function tooLongMessage(limit: number): string {
	const seconds = Math.round(limit / 1000);
	return (
		`the check took longer than ${seconds} s and was stopped. ` +
		'Try fewer spans or loads, or change an input to run it again.'
	);
}

interface Request {
	seq: number;
	case: CaseFile;
	/** The case as JSON: a newer request for the same case shares this one's answer. */
	key: string;
	/** Units of the share texts. */
	units?: 'si' | 'us';
	/** Also compute the governing capacity curve (the slow part, asked for after the answer). */
	curve: boolean;
	resolve: (outcome: CheckOutcome) => void;
}

interface Running extends Request {
	started: number;
	timer: ReturnType<typeof setTimeout>;
}

function spawnWorker(): EnginePort {
	const worker = new Worker(new URL('./engine.worker.ts', import.meta.url), { type: 'module' });
	const port: EnginePort = {
		postMessage: (message) => worker.postMessage(message),
		terminate: () => worker.terminate(),
		onmessage: null,
		onerror: null,
		onmessageerror: null
	};
	worker.onmessage = (event: MessageEvent<EngineReply>) => port.onmessage?.(event);
	worker.onerror = (event) => port.onerror?.(event);
	worker.onmessageerror = (event) => port.onmessageerror?.(event);
	return port;
}

/**
 * Runs checks in a Web Worker, one at a time, latest answer wins. A worker cannot be interrupted
 * mid-computation, so a check still running when a newer one has waited `grace` ms is abandoned
 * with its worker and a fresh worker starts; a check past `limit` is stopped the same way. Every
 * request resolves, with an error outcome if need be: the form never waits forever.
 */
export class EngineRunner {
	#spawn: () => EnginePort | null;
	#grace: number;
	#coldGrace: number;
	#limit: number;
	#port: EnginePort | null = null;
	/** No worker can run here: checks run on the page. */
	#onPage = false;
	/** A worker has answered at least once, so an error later is a crash, not a failed start. */
	#answered = false;
	/** The current worker has answered, so it has the engine loaded. */
	#warm = false;
	#seq = 0;
	#running: Running | null = null;
	#next: Request | null = null;
	#graceTimer: ReturnType<typeof setTimeout> | undefined;

	constructor(options: EngineRunnerOptions = {}) {
		this.#spawn = options.spawn ?? spawnWorker;
		this.#grace = options.grace ?? 1000;
		this.#coldGrace = options.coldGrace ?? 2000;
		this.#limit = options.limit ?? 20_000;
		// Start the worker now so the first check does not pay for loading the engine.
		this.#ensurePort();
	}

	/** Checks one plain (snapshot) case, share texts in `units`; always resolves. */
	run(c: CaseFile, units?: 'si' | 'us', curve = true): Promise<CheckOutcome> {
		if (this.#onPage) return this.#runHere(c, units, curve);
		const seq = ++this.#seq;
		const key = `${units ?? 'si'} ${curve ? 'curve' : 'answer'} ${keyOf(c, seq)}`;
		return new Promise((resolve) => {
			// The same case again (e.g. opened, then saved as a draft) waits for the answer in progress.
			const same = [this.#running, this.#next].find((r) => r?.key === key);
			if (this.#next !== same) {
				this.#next?.resolve(REPLACED);
				this.#next = null;
			}
			if (same) {
				const earlier = same.resolve;
				same.resolve = (outcome) => {
					earlier(outcome);
					resolve(outcome);
				};
				return;
			}
			this.#next = { seq, case: c, key, units, curve, resolve };
			this.#pump();
		});
	}

	dispose(): void {
		clearTimeout(this.#graceTimer);
		this.#killWorker();
		this.#release(REPLACED);
		this.#next?.resolve(REPLACED);
		this.#next = null;
	}

	// Starts the newest request when the worker is free, or replaces a worker busy past the grace.
	#pump(): void {
		if (!this.#next) return;
		if (this.#running) {
			// Replacing a worker that is still loading would only start the loading over.
			const grace = this.#warm ? this.#grace : Math.max(this.#grace, this.#coldGrace);
			const left = this.#running.started + grace - Date.now();
			if (left > 0) {
				clearTimeout(this.#graceTimer);
				this.#graceTimer = setTimeout(() => this.#pump(), left);
				return;
			}
			this.#killWorker();
			this.#release(REPLACED);
		}
		clearTimeout(this.#graceTimer);
		const request = this.#next;
		this.#next = null;
		const port = this.#ensurePort();
		if (!port) {
			void this.#runHere(request.case, request.units, request.curve).then(request.resolve);
			return;
		}
		const limit = this.#limit;
		const timer = setTimeout(() => this.#stopWorker(failed(tooLongMessage(limit))), limit);
		this.#running = { ...request, started: Date.now(), timer };
		try {
			const { seq, units, curve } = request;
			port.postMessage({ seq, json: request.case, units, curve });
		} catch (error) {
			// The case could not be copied to the worker (e.g. nested too deeply).
			this.#finish(failed(`the case could not be passed to the engine (${describe(error)}).`));
		}
	}

	#ensurePort(): EnginePort | null {
		if (this.#port || this.#onPage) return this.#port;
		let port: EnginePort | null = null;
		try {
			port = this.#spawn();
		} catch {
			port = null;
		}
		if (!port) {
			this.#onPage = true;
			return null;
		}
		port.onmessage = (event) => this.#settle(port, event.data);
		port.onerror = (event) => {
			event.preventDefault?.();
			this.#crashed(port, event.message);
		};
		port.onmessageerror = () => {
			if (port === this.#port) this.#finish(failed('the answer could not be read by the page.'));
		};
		this.#port = port;
		return port;
	}

	#settle(port: EnginePort, reply: EngineReply): void {
		// Answers from a worker already replaced, or to a request already given up, are dropped.
		if (port !== this.#port || !this.#running) return;
		this.#answered = true;
		this.#warm = true;
		if (reply.seq !== this.#running.seq && reply.seq !== 0) return;
		this.#finish('error' in reply ? failed(reply.error) : toCheckOutcome(reply.result));
	}

	// Resolves the running request and moves on to the next one.
	#finish(outcome: CheckOutcome): void {
		this.#release(outcome);
		this.#pump();
	}

	#release(outcome: CheckOutcome): void {
		const running = this.#running;
		if (!running) return;
		clearTimeout(running.timer);
		this.#running = null;
		running.resolve(outcome);
	}

	// A worker cannot be interrupted, only terminated; the next request starts a fresh one.
	#killWorker(): void {
		this.#port?.terminate();
		this.#port = null;
		this.#warm = false;
	}

	#stopWorker(outcome: CheckOutcome): void {
		this.#killWorker();
		this.#finish(outcome);
	}

	#crashed(port: EnginePort, message: string | undefined): void {
		if (port !== this.#port) return;
		if (!this.#answered) {
			// The worker never started (e.g. no module workers here): run on the page from now on.
			this.#killWorker();
			this.#onPage = true;
			const running = this.#running;
			this.#running = null;
			if (running) {
				clearTimeout(running.timer);
				void this.#runHere(running.case, running.units, running.curve).then(running.resolve);
			}
			this.#pump();
			return;
		}
		const detail = message ? ` (${message})` : '';
		const stopped = `the engine's worker stopped unexpectedly${detail}.`;
		this.#stopWorker(failed(`${stopped} Change an input to run the check again.`));
	}

	async #runHere(c: CaseFile, units?: 'si' | 'us', curve = true): Promise<CheckOutcome> {
		try {
			const { checkCase } = await import('$lib/engine');
			return runCheck(checkCase, c, units, curve);
		} catch (error) {
			return failed(`the engine could not be loaded (${describe(error)}). Reload the page.`);
		}
	}
}

function keyOf(c: CaseFile, seq: number): string {
	try {
		return JSON.stringify(c);
	} catch {
		return `unreadable ${seq}`;
	}
}

function failed(message: string): CheckOutcome {
	return { state: 'error', message };
}

function describe(error: unknown): string {
	return error instanceof Error ? error.message : String(error);
}
