/// <reference lib="webworker" />
/**
 * Runs the engine off the main thread, so typing and scrolling stay smooth while a beam of
 * several spans is checked. One message in (a case), one message out (the outcome).
 */
import { checkCase } from '$lib/engine';

/** A request: the case to check, with a number that comes back on the answer. */
export interface EngineRequest {
	seq: number;
	json: unknown;
}

/** The answer: the engine's outcome, or the message of a broken invariant. */
export type EngineReply = { seq: number; result: ReturnType<typeof checkCase> } | { seq: number; error: string };

self.onmessage = (event: MessageEvent<EngineRequest>) => {
	const { seq, json } = event.data;
	let reply: EngineReply;
	try {
		reply = { seq, result: checkCase(json, { curve: true }) };
	} catch (error) {
		reply = { seq, error: error instanceof Error ? error.message : String(error) };
	}
	self.postMessage(reply);
};
