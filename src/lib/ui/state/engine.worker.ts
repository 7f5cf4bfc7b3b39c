/// <reference lib="webworker" />
/**
 * Runs the engine off the main thread, so typing and scrolling stay smooth while a beam of
 * several spans is checked. One message in (a case), one message out (the outcome). The page
 * sends one request at a time and terminates this worker when a check runs too long.
 */
import { checkCase } from '$lib/engine';

/** A request: the case to check, with a number that comes back on the answer. */
export interface EngineRequest {
	seq: number;
	json: unknown;
	/** Units of the share texts (the report's numbers stay SI). */
	units?: 'si' | 'us';
	/** Also compute the governing capacity curve (default true). */
	curve?: boolean;
}

/**
 * The answer: the engine's outcome, or a plain message when the engine threw. `seq` 0 answers
 * the request in progress when its own number could not be read.
 */
export type EngineReply =
	{ seq: number; result: ReturnType<typeof checkCase> } | { seq: number; error: string };

function describe(error: unknown): string {
	return error instanceof Error ? error.message : String(error);
}

self.onmessage = (event: MessageEvent<EngineRequest>) => {
	const seq = typeof event.data?.seq === 'number' ? event.data.seq : 0;
	let reply: EngineReply;
	try {
		const { json, units, curve } = event.data;
		reply = { seq, result: checkCase(json, { curve: curve ?? true, units }) };
	} catch (error) {
		reply = { seq, error: describe(error) };
	}
	try {
		self.postMessage(reply);
	} catch (error) {
		// A result that cannot be copied back must still end the wait on the page.
		self.postMessage({ seq, error: `the result could not be passed back (${describe(error)})` });
	}
};

self.onmessageerror = () => {
	const reply: EngineReply = { seq: 0, error: 'the case could not be read by the engine.' };
	self.postMessage(reply);
};
