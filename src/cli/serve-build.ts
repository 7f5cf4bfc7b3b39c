/**
 * Serves the built app (build/) the way a static host would: unknown paths get the 200.html shell,
 * hashed assets under /_app/immutable are cacheable forever, everything else must revalidate
 * (so a new service worker is always seen). Prints the local and LAN addresses for a phone.
 *
 * `npm run preview` / `npm start`; PORT and HOST may be set in the environment.
 */
import { createServer } from 'node:http';
import { readFile, stat } from 'node:fs/promises';
import { networkInterfaces } from 'node:os';
import { extname, join, normalize, resolve } from 'node:path';

const root = resolve(process.env.BUILD_DIR ?? 'build');
const port = Number(process.env.PORT ?? 4173);
const host = process.env.HOST ?? '0.0.0.0';

const TYPES: Record<string, string> = {
	'.html': 'text/html; charset=utf-8',
	'.js': 'text/javascript; charset=utf-8',
	'.css': 'text/css; charset=utf-8',
	'.json': 'application/json; charset=utf-8',
	'.webmanifest': 'application/manifest+json; charset=utf-8',
	'.png': 'image/png',
	'.svg': 'image/svg+xml',
	'.ico': 'image/x-icon',
	'.txt': 'text/plain; charset=utf-8'
};

/** Maps a URL path to a file in build/, trying the prerendered `.html` and `/index.html` forms. */
async function findFile(pathname: string): Promise<string | null> {
	const safe = normalize(decodeURIComponent(pathname)).replace(/^(\.\.[/\\])+/, '');
	const base = join(root, safe);
	if (!base.startsWith(root)) return null;
	for (const candidate of [base, `${base}.html`, join(base, 'index.html')]) {
		try {
			if ((await stat(candidate)).isFile()) return candidate;
		} catch {
			// try the next form
		}
	}
	return null;
}

const server = createServer(async (req, res) => {
	try {
		const url = new URL(req.url ?? '/', 'http://localhost');
		const file = (await findFile(url.pathname)) ?? join(root, '200.html');
		const body = await readFile(file);
		const immutable = url.pathname.startsWith('/_app/immutable/');
		res.writeHead(200, {
			'content-type': TYPES[extname(file)] ?? 'application/octet-stream',
			'cache-control': immutable ? 'public, max-age=31536000, immutable' : 'no-cache',
			'x-content-type-options': 'nosniff'
		});
		res.end(req.method === 'HEAD' ? undefined : body);
	} catch (error) {
		res.writeHead(500, { 'content-type': 'text/plain' });
		res.end(`server error: ${error instanceof Error ? error.message : String(error)}`);
	}
});

server.listen(port, host, () => {
	const lan = Object.values(networkInterfaces())
		.flat()
		.filter((n) => n && n.family === 'IPv4' && !n.internal)
		.map((n) => `http://${n!.address}:${port}`);
	console.log(`Hingepoint is served from ${root}`);
	console.log(`  on this machine:  http://localhost:${port}`);
	for (const address of lan)
		console.log(`  on your network:  ${address}  (open on a phone on the same network)`);
	if (lan.length === 0) console.log('  no network address found: only this machine can open it');
});
