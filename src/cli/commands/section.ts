import type { CliCommand } from './index';
import { findSection, resolveSection, suggestSections } from '../../lib/engine/section/index';
import { formatSig, toSectionJson } from './section-json';

/** Unit and scale for the readable summary of each property (mm-based values ÷ scale). */
const PROPERTY_UNITS: Record<string, [string, number]> = {
	A: ['cm²', 100], mass: ['kg/m', 1], Iy: ['cm⁴', 1e4], Iz: ['cm⁴', 1e4], Wely: ['cm³', 1e3],
	Wply: ['cm³', 1e3], Welz: ['cm³', 1e3], Wplz: ['cm³', 1e3], It: ['cm⁴', 1e4], Iw: ['dm⁶', 1e12],
	iy: ['mm', 1], iz: ['mm', 1], Avz: ['cm²', 100], d: ['mm', 1]
};

/** `section "<designation>" [--loss mm] [--json]`: one section; exit 2 naming the nearest if unknown. */
export const sectionCommand: CliCommand = {
	summary: 'show one section: section "UB 305x165x40" [--loss <mm per face>] [--json]',
	async run(args) {
		const lossAt = args.indexOf('--loss');
		const loss = lossAt >= 0 ? Number(args[lossAt + 1]) : 0;
		const text = args.filter((a, i) => !a.startsWith('--') && (lossAt < 0 || i !== lossAt + 1)).join(' ');
		if (text.trim() === '') {
			process.stderr.write('usage: section "<designation>" [--loss <mm>] [--json]\n');
			return 2;
		}
		if (!findSection(text)) {
			process.stderr.write(`unknown section "${text}"; nearest: ${suggestSections(text, 5).join(', ')}\n`);
			return 2;
		}
		const resolved = resolveSection({ designation: text }, { loss });
		if (!resolved.ok) {
			for (const issue of resolved.issues) process.stderr.write(`${issue.path}: ${issue.message}\n`);
			return 2;
		}
		const section = resolved.value;
		if (args.includes('--json')) {
			process.stdout.write(JSON.stringify(toSectionJson(section)) + '\n');
			return 0;
		}
		const dims = Object.entries(section.dims ?? {}).map(([k, v]) => `${k} ${formatSig(v)}`).join(', ');
		const props = Object.entries(section.props ?? {}).map(
			([k, v]) => `  ${k.padEnd(6)} ${formatSig(v / PROPERTY_UNITS[k][1]).padStart(10)} ${PROPERTY_UNITS[k][0]}`
		);
		const lossLine = section.loss > 0 ? [`loss ${section.loss} mm per exposed face applied`] : [];
		const out = [`${section.designation}  (${section.family}, ${section.standard})`, `dims (mm): ${dims}`, ...lossLine, ...props];
		process.stdout.write(out.join('\n') + '\n');
		return 0;
	}
};
