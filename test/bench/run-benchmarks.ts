/**
 * `npm run bench`: runs every `test/bench/*-bench.ts` module's exported `run…Bench` functions.
 * Benchmarks print medians; they never assert (speed is measured, not tested).
 */
import { readdirSync } from 'node:fs';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { dirname, join } from 'node:path';

const here = dirname(fileURLToPath(import.meta.url));
const modules = readdirSync(here)
	.filter((name) => name.endsWith('-bench.ts'))
	.sort();

for (const name of modules) {
	const module = (await import(pathToFileURL(join(here, name)).href)) as Record<string, unknown>;
	for (const [exported, value] of Object.entries(module)) {
		if (typeof value === 'function' && /^run\w*Bench$/.test(exported)) {
			console.log(`\n# ${name} — ${exported}`);
			await (value as () => Promise<void> | void)();
		}
	}
}
if (modules.length === 0) console.log('no benchmarks found');
