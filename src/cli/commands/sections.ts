import type { CliCommand } from './index';
import { listSections } from '../../lib/engine/section/index';
import { formatSig, toSectionJson } from './section-json';

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
		const head = `${'designation'.padEnd(22)}${'kg/m'.padStart(8)}${'A cm²'.padStart(9)}${'Iy cm⁴'.padStart(10)}${'Wpl,y cm³'.padStart(11)}`;
		const lines = sections.map((s) =>
			[
				s.designation.padEnd(22),
				formatSig(s.props.mass).padStart(8),
				formatSig(s.props.A / 100).padStart(9),
				formatSig(s.props.Iy / 1e4).padStart(10),
				formatSig(s.props.Wply / 1e3).padStart(11)
			].join('')
		);
		process.stdout.write([head, ...lines, `${sections.length} sections`].join('\n') + '\n');
		return 0;
	}
};
