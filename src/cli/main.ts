/**
 * Command-line entry: `npm run --silent cli -- <command> [args]`.
 * Each command lives in its own module under ./commands and returns its exit code:
 * 0 done, 1 internal failure, 2 bad input.
 */
import { commands } from './commands/index';

async function main(argv: string[]): Promise<number> {
	const [name, ...rest] = argv;
	const command = name ? commands[name] : undefined;
	if (!command) {
		const list = Object.entries(commands)
			.map(([n, c]) => `  ${n.padEnd(10)} ${c.summary}`)
			.join('\n');
		process.stderr.write(`usage: hingepoint <command> [options]\n\ncommands:\n${list}\n`);
		return name ? 2 : 0;
	}
	return command.run(rest);
}

main(process.argv.slice(2)).then(
	(code) => {
		process.exitCode = code;
	},
	(error: unknown) => {
		process.stderr.write(
			`internal error: ${error instanceof Error ? error.stack : String(error)}\n`
		);
		process.exitCode = 1;
	}
);
