import type { CliCommand } from './index';
import { listSections } from '../../lib/engine/section/index';
import { formatSig, toSectionJson } from './section-json';

/** Column headings and widths of the readable table. */
const COLUMNS: [string, number][] = [
	['designation', 22],
	['kg/m', 8],
	['A cm²', 9],
	['Iy cm⁴', 10],
	['Wpl,y cm³', 11]
];

/** `sections [--family UB] [--json]`: every library section, as JSON or a table. */
export const sectionsCommand: CliCommand = {
	summary: 'list the section library (--family UB|UC|IPE|HEA|HEB|W|SHS|RHS|CHS, --json)',
	async run(args) {
		const familyAt = args.indexOf('--family');
		const family = familyAt >= 0 ? args[familyAt + 1]?.toUpperCase() : undefined;
		const sections = listSections().filter((s) => !family || s.family === family);
		if (family && sections.length === 0) {
			process.stderr.write(`no sections in family "${family}"\n`);
			return 2;
		}
		if (args.includes('--json')) {
			process.stdout.write(JSON.stringify(sections.map(toSectionJson)) + '\n');
			return 0;
		}
		const head = COLUMNS.map(([name, w], i) => (i === 0 ? name.padEnd(w) : name.padStart(w)));
		const lines = sections.map((s) => {
			const { mass, A, Iy, Wply } = s.props;
			const cells = [mass, A / 100, Iy / 1e4, Wply / 1e3].map((v, i) =>
				formatSig(v).padStart(COLUMNS[i + 1][1])
			);
			return s.designation.padEnd(COLUMNS[0][1]) + cells.join('');
		});
		process.stdout.write(
			[head.join(''), ...lines, `${sections.length} sections`].join('\n') + '\n'
		);
		return 0;
	}
};
