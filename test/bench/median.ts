/** Median wall time of `fn` in milliseconds over `runs` runs after `warmup` unmeasured runs. */
export function medianMs(fn: () => unknown, runs = 200, warmup = 20): number {
	for (let i = 0; i < warmup; i++) fn();
	const times: number[] = [];
	for (let i = 0; i < runs; i++) {
		const start = performance.now();
		fn();
		times.push(performance.now() - start);
	}
	times.sort((a, b) => a - b);
	return times[Math.floor(times.length / 2)];
}
