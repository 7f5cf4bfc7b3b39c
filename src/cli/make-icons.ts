/**
 * Draws the app icons (our own design: a beam that has just formed a hinge over two supports)
 * and writes them as PNG files to static/icons. No downloaded art: shapes are rasterised here.
 * Run with `npm run icons`; the outputs are committed.
 */
import { mkdirSync, writeFileSync } from 'node:fs';
import { deflateSync } from 'node:zlib';

type Rgb = [number, number, number];
type Shape = { inside: (x: number, y: number) => boolean; colour: Rgb };

const SLATE: Rgb = [0x1f, 0x2a, 0x36];
const ORANGE: Rgb = [0xe0, 0x6a, 0x1b];
const PAPER: Rgb = [0xf4, 0xf1, 0xea];

/** Distance from p to the segment a–b. */
function segmentDistance(px: number, py: number, ax: number, ay: number, bx: number, by: number) {
	const dx = bx - ax;
	const dy = by - ay;
	const t = Math.max(0, Math.min(1, ((px - ax) * dx + (py - ay) * dy) / (dx * dx + dy * dy)));
	return Math.hypot(px - ax - t * dx, py - ay - t * dy);
}

function triangle(ax: number, ay: number, bx: number, by: number, cx: number, cy: number) {
	const side = (x: number, y: number, x1: number, y1: number, x2: number, y2: number) =>
		(x - x2) * (y1 - y2) - (x1 - x2) * (y - y2);
	return (x: number, y: number) => {
		const d1 = side(x, y, ax, ay, bx, by);
		const d2 = side(x, y, bx, by, cx, cy);
		const d3 = side(x, y, cx, cy, ax, ay);
		return !((d1 < 0 || d2 < 0 || d3 < 0) && (d1 > 0 || d2 > 0 || d3 > 0));
	};
}

/** The drawing in unit coordinates (0..1), scaled by `zoom` about the centre (maskable safe zone). */
function drawing(zoom: number, roundBackground: boolean): Shape[] {
	const z = (v: number) => 0.5 + (v - 0.5) * zoom;
	const beam = 0.055 * zoom;
	const ring = 0.085 * zoom;
	const background = roundBackground
		? (x: number, y: number) => {
				const r = 0.18;
				const cx = Math.min(Math.max(x, r), 1 - r);
				const cy = Math.min(Math.max(y, r), 1 - r);
				return Math.hypot(x - cx, y - cy) <= r;
			}
		: () => true;
	return [
		{ inside: background, colour: SLATE },
		{ inside: triangle(z(0.16), z(0.62), z(0.08), z(0.76), z(0.24), z(0.76)), colour: PAPER },
		{ inside: triangle(z(0.84), z(0.62), z(0.76), z(0.76), z(0.92), z(0.76)), colour: PAPER },
		{
			inside: (x, y) => segmentDistance(x, y, z(0.12), z(0.56), z(0.5), z(0.66)) <= beam,
			colour: ORANGE
		},
		{
			inside: (x, y) => segmentDistance(x, y, z(0.5), z(0.66), z(0.88), z(0.56)) <= beam,
			colour: ORANGE
		},
		{ inside: (x, y) => Math.hypot(x - z(0.5), y - z(0.66)) <= ring, colour: ORANGE },
		{ inside: (x, y) => Math.hypot(x - z(0.5), y - z(0.66)) <= ring * 0.5, colour: PAPER },
		// The load arrow bears down on the hinge.
		{ inside: triangle(z(0.5), z(0.52), z(0.4), z(0.36), z(0.6), z(0.36)), colour: PAPER },
		{
			inside: (x, y) => Math.abs(x - z(0.5)) <= 0.02 * zoom && y >= z(0.16) && y <= z(0.38),
			colour: PAPER
		}
	];
}

/** Rasterises with 4×4 supersampling; pixels outside every shape stay transparent. */
function rasterise(size: number, shapes: Shape[]): Buffer {
	const samples = 4;
	const rows: Buffer[] = [];
	for (let py = 0; py < size; py++) {
		const row = Buffer.alloc(1 + size * 4);
		for (let px = 0; px < size; px++) {
			let r = 0,
				g = 0,
				b = 0,
				a = 0;
			for (let sy = 0; sy < samples; sy++) {
				for (let sx = 0; sx < samples; sx++) {
					const x = (px + (sx + 0.5) / samples) / size;
					const y = (py + (sy + 0.5) / samples) / size;
					const top = shapes.findLast((s) => s.inside(x, y));
					if (!top) continue;
					r += top.colour[0];
					g += top.colour[1];
					b += top.colour[2];
					a += 1;
				}
			}
			const o = 1 + px * 4;
			row[o] = a ? Math.round(r / a) : 0;
			row[o + 1] = a ? Math.round(g / a) : 0;
			row[o + 2] = a ? Math.round(b / a) : 0;
			row[o + 3] = Math.round((255 * a) / (samples * samples));
		}
		rows.push(row);
	}
	return encodePng(size, Buffer.concat(rows));
}

const CRC_TABLE = Array.from({ length: 256 }, (_, n) => {
	let c = n;
	for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
	return c >>> 0;
});
function crc32(data: Buffer): number {
	let c = 0xffffffff;
	for (const byte of data) c = CRC_TABLE[(c ^ byte) & 0xff] ^ (c >>> 8);
	return (c ^ 0xffffffff) >>> 0;
}
function chunk(type: string, data: Buffer): Buffer {
	const length = Buffer.alloc(4);
	length.writeUInt32BE(data.length);
	const body = Buffer.concat([Buffer.from(type, 'ascii'), data]);
	const crc = Buffer.alloc(4);
	crc.writeUInt32BE(crc32(body));
	return Buffer.concat([length, body, crc]);
}
function encodePng(size: number, scanlines: Buffer): Buffer {
	const header = Buffer.alloc(13);
	header.writeUInt32BE(size, 0);
	header.writeUInt32BE(size, 4);
	header[8] = 8; // bit depth
	header[9] = 6; // RGBA
	return Buffer.concat([
		Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
		chunk('IHDR', header),
		chunk('IDAT', deflateSync(scanlines, { level: 9 })),
		chunk('IEND', Buffer.alloc(0))
	]);
}

const out = new URL('../../static/icons/', import.meta.url);
mkdirSync(out, { recursive: true });
writeFileSync(new URL('icon-192.png', out), rasterise(192, drawing(1, true)));
writeFileSync(new URL('icon-512.png', out), rasterise(512, drawing(1, true)));
// Maskable: full-bleed ground, drawing inside the central 80 % safe zone.
writeFileSync(new URL('icon-maskable-512.png', out), rasterise(512, drawing(0.72, false)));
console.log('icons written to static/icons');
