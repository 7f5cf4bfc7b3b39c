import type { CliCommand } from './index';
import { listSectionFamilies, listSections } from '../../lib/engine/section/index';
import { formatSig, toSectionJson } from './section-json';

/** Column headings and widths of the readable table. */
const COLUMNS: [string, number][] = [
	['designation', 22],
	['kg/m', 8],
	['A cm²', 9],
	['Iy cm⁴', 10],
	['Wpl,y cm³', 11]
];

/** Words for the shapes of a family: a US HSS holds rectangular, square and round tubes. */
const SHAPE_WORDS: Record<string, string> = {
	I: 'I/H',
	RHS: 'rectangular/square hollow',
	CHS: 'round hollow',
	flat: 'flat'
};

/** The families of the tables, one line each: id, shapes, rows, standard. */
function describeFamilies(): string {
	return listSectionFamilies()
		.map((f) => {
			const shapes = f.shapes.map((s) => SHAPE_WORDS[s] ?? s).join(', ');
			return `  ${f.family.padEnd(6)} ${String(f.count).padStart(4)}  ${shapes}; ${f.standards.join('; ')}`;
		})
		.join('\n');
}

/** `CF SHS` or `cf-shs` as typed, read as the family id `CFSHS`. */
function readFamily(text: string | undefined): string | undefined {
	return text?.toUpperCase().replace(/[\s_-]+/g, '');
}

/** `sections [--family UB] [--json]`: every library section, as JSON or a table. */
export const sectionsCommand: CliCommand = {
	// Read from the tables when asked, so every family they hold is listed and none twice.
	get summary() {
		const families = listSectionFamilies().map((f) => f.family);
		return `list the section library (--family ${families.join('|')}, --json)`;
	},
	async run(args) {
		const familyAt = args.indexOf('--family');
		const family = familyAt >= 0 ? readFamily(args[familyAt + 1]) : undefined;
		if (familyAt >= 0 && !family) {
			process.stderr.write(`--family takes one of these families:\n${describeFamilies()}\n`);
			return 2;
		}
		const sections = listSections().filter((s) => !family || s.family === family);
		if (family && sections.length === 0) {
			process.stderr.write(
				`no sections in family "${family}"; the families are:\n${describeFamilies()}\n`
			);
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
