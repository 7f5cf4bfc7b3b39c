import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import {
	EngineRunner,
	REPLACED,
	tooLongMessage,
	type EnginePort
} from '../../../src/lib/ui/state/engine-runner';
import type { EngineReply, EngineRequest } from '../../../src/lib/ui/state/engine.worker';
import type { CaseFile } from '../../../src/lib/ui/state/case-file';
import type { CheckOutcome } from '../../../src/lib/ui/state/check-outcome';

/** A worker the test answers by hand; it never computes anything itself. */
class FakePort implements EnginePort {
	received: EngineRequest[] = [];
	terminated = false;
	onmessage: EnginePort['onmessage'] = null;
	onerror: EnginePort['onerror'] = null;
	onmessageerror: EnginePort['onmessageerror'] = null;
	postMessage(message: EngineRequest): void {
		this.received.push(message);
	}
	terminate(): void {
		this.terminated = true;
	}
	answer(reply: EngineReply): void {
		this.onmessage?.({ data: reply });
	}
	/** The newest request's number. */
	get last(): number {
		return this.received[this.received.length - 1].seq;
	}
}

// Only the identity matters to the runner: the fake worker never reads the case.
const caseNamed = (title: string) => ({ title }) as unknown as CaseFile;
const refused = { ok: false, issues: [] } as unknown as Extract<
	EngineReply,
	{ result: unknown }
>['result'];

let ports: FakePort[];
const spawn = () => {
	const port = new FakePort();
	ports.push(port);
	return port;
};

/** Collects what a run resolves to, so a test can see whether it has resolved yet. */
function watch(promise: Promise<CheckOutcome>): { outcome: CheckOutcome | null } {
	const seen: { outcome: CheckOutcome | null } = { outcome: null };
	void promise.then((outcome) => (seen.outcome = outcome));
	return seen;
}

/** Has the worker answer once, so it counts as loaded. */
async function warmUp(runner: EngineRunner): Promise<void> {
	const first = runner.run(caseNamed('warm-up'));
	const port = ports[ports.length - 1];
	port.answer({ seq: port.last, result: refused });
	await first;
}

beforeEach(() => {
	vi.useFakeTimers();
	ports = [];
});
afterEach(() => vi.useRealTimers());

describe('engine runner', () => {
	it('answers a check from the worker', async () => {
		const runner = new EngineRunner({ spawn });
		const first = runner.run(caseNamed('a'));
		expect(ports).toHaveLength(1);
		expect(ports[0].received.map((r) => r.json)).toEqual([caseNamed('a')]);
		ports[0].answer({ seq: ports[0].last, result: refused });
		expect(await first).toEqual({ state: 'issues', issues: [] });
	});

	it('sends one request at a time and skips to the newest', async () => {
		const runner = new EngineRunner({ spawn, grace: 250 });
		const a = watch(runner.run(caseNamed('a')));
		const b = watch(runner.run(caseNamed('b')));
		const c = watch(runner.run(caseNamed('c')));
		await vi.advanceTimersByTimeAsync(0);
		// b waited behind a and was overtaken by c before it was ever sent.
		expect(b.outcome).toEqual(REPLACED);
		expect(ports[0].received.map((r) => r.json)).toEqual([caseNamed('a')]);
		ports[0].answer({ seq: ports[0].last, result: refused });
		await vi.advanceTimersByTimeAsync(0);
		expect(a.outcome?.state).toBe('issues');
		expect(ports[0].received.map((r) => r.json)).toEqual([caseNamed('a'), caseNamed('c')]);
		ports[0].answer({ seq: ports[0].last, result: refused });
		await vi.advanceTimersByTimeAsync(0);
		expect(c.outcome?.state).toBe('issues');
		expect(ports).toHaveLength(1);
	});

	it('lets a request for the same case share the answer in progress instead of replacing it', async () => {
		const runner = new EngineRunner({ spawn, grace: 250 });
		await warmUp(runner);
		const first = watch(runner.run(caseNamed('demo')));
		const other = watch(runner.run(caseNamed('other')));
		const again = watch(runner.run(caseNamed('demo')));
		await vi.advanceTimersByTimeAsync(1000);
		// Same case as the one running: no new worker, and the case in between is dropped.
		expect(ports).toHaveLength(1);
		expect(other.outcome).toEqual(REPLACED);
		ports[0].answer({ seq: ports[0].last, result: refused });
		await vi.advanceTimersByTimeAsync(0);
		expect(first.outcome?.state).toBe('issues');
		expect(again.outcome?.state).toBe('issues');
		expect(ports[0].received).toHaveLength(2);
	});

	it('replaces a worker still busy after the grace time when a newer check waits', async () => {
		const runner = new EngineRunner({ spawn, grace: 250 });
		await warmUp(runner);
		const slow = watch(runner.run(caseNamed('slow')));
		await vi.advanceTimersByTimeAsync(100);
		const fresh = watch(runner.run(caseNamed('fresh')));
		await vi.advanceTimersByTimeAsync(149);
		expect(ports).toHaveLength(1);
		expect(slow.outcome).toBeNull();
		await vi.advanceTimersByTimeAsync(1);
		expect(ports[0].terminated).toBe(true);
		expect(slow.outcome).toEqual(REPLACED);
		expect(ports).toHaveLength(2);
		expect(ports[1].received.map((r) => r.json)).toEqual([caseNamed('fresh')]);
		expect(ports[0].received.map((r) => r.json)).toEqual([caseNamed('warm-up'), caseNamed('slow')]);
		// A late answer from the old worker is not taken for the new check.
		ports[0].answer({ seq: ports[0].last, error: 'late' });
		expect(fresh.outcome).toBeNull();
		ports[1].answer({ seq: ports[1].last, result: refused });
		await vi.advanceTimersByTimeAsync(0);
		expect(fresh.outcome?.state).toBe('issues');
	});

	it('replaces at once a worker already past the grace time', async () => {
		const runner = new EngineRunner({ spawn, grace: 250 });
		await warmUp(runner);
		const slow = watch(runner.run(caseNamed('slow')));
		await vi.advanceTimersByTimeAsync(1000);
		runner.run(caseNamed('fresh'));
		await vi.advanceTimersByTimeAsync(0);
		expect(slow.outcome).toEqual(REPLACED);
		expect(ports).toHaveLength(2);
	});

	it('gives a worker that has not answered yet longer, as it may still be loading the engine', async () => {
		const runner = new EngineRunner({ spawn, grace: 250, coldGrace: 2000 });
		const first = watch(runner.run(caseNamed('first')));
		await vi.advanceTimersByTimeAsync(300);
		runner.run(caseNamed('second'));
		await vi.advanceTimersByTimeAsync(1699);
		expect(ports).toHaveLength(1);
		expect(first.outcome).toBeNull();
		await vi.advanceTimersByTimeAsync(1);
		expect(first.outcome).toEqual(REPLACED);
		expect(ports).toHaveLength(2);
	});

	it('stops a check that runs past the limit with a clear message, and recovers', async () => {
		const runner = new EngineRunner({ spawn, limit: 20_000 });
		const stuck = watch(runner.run(caseNamed('stuck')));
		await vi.advanceTimersByTimeAsync(19_999);
		expect(stuck.outcome).toBeNull();
		await vi.advanceTimersByTimeAsync(1);
		expect(stuck.outcome).toEqual({ state: 'error', message: tooLongMessage(20_000) });
		expect(tooLongMessage(20_000)).toMatch(/longer than 20 s and was stopped/);
		expect(ports[0].terminated).toBe(true);
		const next = runner.run(caseNamed('next'));
		expect(ports).toHaveLength(2);
		ports[1].answer({ seq: ports[1].last, result: refused });
		expect((await next).state).toBe('issues');
	});

	it('passes an error thrown in the engine back as the message', async () => {
		const runner = new EngineRunner({ spawn });
		const run = runner.run(caseNamed('a'));
		ports[0].answer({ seq: ports[0].last, error: 'span table is empty' });
		expect(await run).toEqual({ state: 'error', message: 'span table is empty' });
	});

	it('answers with a message when the worker crashes after it had worked', async () => {
		const runner = new EngineRunner({ spawn });
		const first = runner.run(caseNamed('a'));
		ports[0].answer({ seq: ports[0].last, result: refused });
		await first;
		const second = runner.run(caseNamed('b'));
		ports[0].onerror?.({ message: 'out of memory' });
		const outcome = await second;
		expect(outcome.state).toBe('error');
		expect(outcome.state === 'error' && outcome.message).toMatch(
			/stopped unexpectedly \(out of memory\)/
		);
		runner.run(caseNamed('c'));
		expect(ports).toHaveLength(2);
	});

	it('answers with a message when the case cannot be copied to the worker', async () => {
		const runner = new EngineRunner({
			spawn: () => {
				const port = spawn();
				port.postMessage = () => {
					throw new RangeError('Maximum call stack size exceeded');
				};
				return port;
			}
		});
		const outcome = await runner.run(caseNamed('deep'));
		expect(outcome.state === 'error' && outcome.message).toMatch(
			/could not be passed to the engine/
		);
	});

	it('answers with a message when the answer cannot be read', async () => {
		const runner = new EngineRunner({ spawn });
		const run = runner.run(caseNamed('a'));
		ports[0].onmessageerror?.({});
		expect((await run).state).toBe('error');
	});

	it('resolves everything still waiting when disposed', async () => {
		const runner = new EngineRunner({ spawn });
		const a = runner.run(caseNamed('a'));
		const b = runner.run(caseNamed('b'));
		runner.dispose();
		expect(await a).toEqual(REPLACED);
		expect(await b).toEqual(REPLACED);
		expect(ports[0].terminated).toBe(true);
	});
});
