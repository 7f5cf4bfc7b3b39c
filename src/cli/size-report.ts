/**
 * `npm run size`: gzip size of the JS and CSS a first visit loads, per entry page of the built app
 * (run `npm run build` first). Reads the prerendered HTML for the module preloads, scripts and
 * stylesheets kit puts there, then follows each module's static imports. Reports; never fails a build.
 */
import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';

const BUILD = 'build';
const PAGES = ['index.html', 'check.html'];
const BUDGET_JS = 100 * 1024;

function assetsOf(html: string): string[] {
	const refs = [...html.matchAll(/(?:href|src)="([^"]+\.(?:js|css))"/g)].map((m) => m[1]);
	// kit's boot script imports start/app entries by path inside an inline script.
	const imports = [...html.matchAll(/import\("([^"]+\.js)"\)/g)].map((m) => m[1]);
	return [...new Set([...refs, ...imports])].map((ref) => ref.replace(/^(\.\/|\/)/, ''));
}

/** Static imports of a built module, resolved relative to it. */
function importsOf(file: string): string[] {
	const code = readFileSync(join(BUILD, file), 'utf8');
	const dir = file.slice(0, file.lastIndexOf('/') + 1);
	return [
		...code.matchAll(/(?:^|[;}\s])import\s*(?:[\w${}\s,*]+from\s*)?["']([^"']+\.js)["']/g)
	].map((m) => new URL(m[1], `http://x/${dir}`).pathname.slice(1));
}

function closure(entries: string[]): string[] {
	const seen = new Set<string>();
	const queue = [...entries];
	while (queue.length) {
		const file = queue.pop()!;
		if (seen.has(file) || !existsSync(join(BUILD, file))) continue;
		seen.add(file);
		if (file.endsWith('.js')) queue.push(...importsOf(file));
	}
	return [...seen];
}

if (!existsSync(BUILD)) {
	console.error('No build/ folder: run `npm run build` first.');
	process.exit(2);
}
for (const page of PAGES) {
	const path = join(BUILD, page);
	if (!existsSync(path)) continue;
	const files = closure(assetsOf(readFileSync(path, 'utf8')));
	const gz = (file: string) => gzipSync(readFileSync(join(BUILD, file))).length;
	const js = files.filter((f) => f.endsWith('.js')).reduce((sum, f) => sum + gz(f), 0);
	const css = files.filter((f) => f.endsWith('.css')).reduce((sum, f) => sum + gz(f), 0);
	const verdict = js <= BUDGET_JS ? 'within' : 'OVER';
	console.log(
		`${page.padEnd(12)} JS ${(js / 1024).toFixed(1)} KiB gzip (${verdict} the 100 KiB budget), ` +
			`CSS ${(css / 1024).toFixed(1)} KiB gzip, ${files.length} files`
	);
}
