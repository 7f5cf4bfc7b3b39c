/** The command registry. Add a command by adding its module here. */
import { sectionsCommand } from './sections';
import { sectionCommand } from './section';
import { checkCommand } from './check';

export interface CliCommand {
	/** One line for the usage text. */
	summary: string;
	/** Runs the command with its own arguments; resolves to the exit code. */
	run(args: string[]): Promise<number>;
}

export const commands: Record<string, CliCommand> = {
	sections: sectionsCommand,
	section: sectionCommand,
	check: checkCommand
};
