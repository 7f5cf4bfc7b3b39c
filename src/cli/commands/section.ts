import type { CliCommand } from './index';
import { findSection, resolveSection, suggestSections } from '../../lib/engine/section/index';
import type { ResolvedSection } from '../../lib/engine/section/index';
import { formatSig, toSectionJson } from './section-json';

/** Unit and divisor for the readable summary of each property (mm-based values ÷ divisor). */
const PROPERTY_UNITS: Record<string, [string, number]> = {
	A: ['cm²', 100],
	mass: ['kg/m', 1],
	Iy: ['cm⁴', 1e4],
	Iz: ['cm⁴', 1e4],
	Wely: ['cm³', 1e3],
	Wply: ['cm³', 1e3],
	Welz: ['cm³', 1e3],
	Wplz: ['cm³', 1e3],
	It: ['cm⁴', 1e4],
	Iw: ['dm⁶', 1e12],
	iy: ['mm', 1],
	iz: ['mm', 1],
	Avz: ['cm²', 100],
	d: ['mm', 1]
};

/** The readable summary: designation, dims, loss and one line per property. */
function formatSummary(section: ResolvedSection): string {
	const dims = Object.entries(section.dims ?? {})
		.map(([k, v]) => `${k} ${formatSig(v)}`)
		.join(', ');
	const props = Object.entries(section.props ?? {}).map(([k, v]) => {
		const [unit, divisor] = PROPERTY_UNITS[k];
		return `  ${k.padEnd(6)} ${formatSig(v / divisor).padStart(10)} ${unit}`;
	});
	const loss = section.loss > 0 ? [`loss ${section.loss} mm per exposed face applied`] : [];
	const title = `${section.designation}  (${section.family}, ${section.standard})`;
	return [title, `dims (mm): ${dims}`, ...loss, ...props].join('\n') + '\n';
}

/** `section "<designation>" [--loss mm] [--json]`: one section; exit 2 naming the nearest. */
export const sectionCommand: CliCommand = {
	summary: 'show one section: section "UB 305x165x40" [--loss <mm per face>] [--json]',
	async run(args) {
		const lossAt = args.indexOf('--loss');
		const loss = lossAt >= 0 ? Number(args[lossAt + 1]) : 0;
		const words = args.filter((a, i) => !a.startsWith('--') && (lossAt < 0 || i !== lossAt + 1));
		const text = words.join(' ');
		if (text.trim() === '') {
			process.stderr.write('usage: section "<designation>" [--loss <mm>] [--json]\n');
			return 2;
		}
		if (!findSection(text)) {
			const near = suggestSections(text, 5).join(', ');
			process.stderr.write(`unknown section "${text}"; nearest: ${near}\n`);
			return 2;
		}
		const resolved = resolveSection({ designation: text }, { loss });
		if (!resolved.ok) {
			for (const i of resolved.issues) process.stderr.write(`${i.path}: ${i.message}\n`);
			return 2;
		}
		const out = args.includes('--json')
			? JSON.stringify(toSectionJson(resolved.value)) + '\n'
			: formatSummary(resolved.value);
		process.stdout.write(out);
		return 0;
	}
};
