/**
 * Command-line reduction of one run file:
 *   npm run --silent reduce -- <run.csv> --config <config.json> [--format json|csv]
 * Prints the result to stdout. On bad input prints each problem to stderr as `file:line:column: CODE message`
 * and exits with status 2; other failures exit with status 1.
 */
import { createReadStream } from 'node:fs';
import { readFile } from 'node:fs/promises';
import { parseArgs } from 'node:util';
import { parseReductionConfig, ReductionConfigError } from '../config';
import { formatResultCsv, reduceRun, ReductionError } from '../reduction';
import { RunFileError } from '../run-file';

/** What `reduce-cli --help` prints. */
export const REDUCE_HELP = `Usage: npm run --silent reduce -- <run.csv> --config <config.json> [--format json|csv]

Reduces one Tunnelwright run file with a reduction configuration and prints the result.

Arguments:
  <run.csv>              run file (canonical columns; see docs/run-file-format.md)

Options:
  -c, --config <file>    reduction configuration, JSON (see docs/reduction-config.md)   [required]
  -f, --format <kind>    json (default): the full result; csv: one row per point
  -h, --help             show this text

Exit status: 0 reduced; 2 bad input (each problem on stderr as file:line:column: CODE message); 1 other failure.
`;

/** Exit status for bad input. */
export const EXIT_BAD_INPUT = 2;

/**
 * Runs the command line.
 * @param argv - arguments after the script name
 * @param out - where the result goes
 * @param err - where problems go
 * @returns the exit status
 */
export async function runReduceCli(argv: string[], out: (text: string) => void, err: (text: string) => void): Promise<number> {
  let parsed;
  try {
    parsed = parseArgs({
      args: argv,
      allowPositionals: true,
      options: {
        config: { type: 'string', short: 'c' },
        format: { type: 'string', short: 'f', default: 'json' },
        help: { type: 'boolean', short: 'h', default: false },
      },
    });
  } catch (error) {
    err(`reduce: ${(error as Error).message}\n\n${REDUCE_HELP}`);
    return EXIT_BAD_INPUT;
  }
  const { values, positionals } = parsed;
  if (values.help) {
    out(REDUCE_HELP);
    return 0;
  }
  const [runPath, ...extra] = positionals;
  const usage = (message: string) => {
    err(`reduce: ${message}\n\n${REDUCE_HELP}`);
    return EXIT_BAD_INPUT;
  };
  if (!runPath) return usage('a run file is required');
  if (extra.length > 0) return usage(`only one run file is accepted; also got ${extra.join(', ')}`);
  if (!values.config) return usage('--config <config.json> is required');
  if (values.format !== 'json' && values.format !== 'csv') return usage(`--format must be json or csv; got ${values.format}`);

  try {
    const configPath = values.config;
    let text: string;
    try {
      text = await readFile(configPath, 'utf8');
    } catch (error) {
      err(`${configPath}:1:1: CONFIG_UNREADABLE ${(error as Error).message}\n`);
      return EXIT_BAD_INPUT;
    }
    const config = parseReductionConfig(text, configPath);
    const result = await reduceRun(createReadStream(runPath), config, { fileName: runPath });
    out(values.format === 'csv' ? formatResultCsv(result) : `${JSON.stringify(result, null, 2)}\n`);
    return 0;
  } catch (error) {
    if (error instanceof RunFileError) {
      for (const issue of error.issues) err(`${issue.fileName}:${issue.line}:${issue.column}: ${issue.code} ${stripLocation(issue.message)}\n`);
      return EXIT_BAD_INPUT;
    }
    if (error instanceof ReductionError) {
      err(`${error.message}\n`);
      return EXIT_BAD_INPUT;
    }
    if (error instanceof ReductionConfigError) {
      for (const issue of error.issues) err(`${values.config}:1:1: CONFIG_INVALID ${issue.path || '(root)'}: ${issue.message}\n`);
      return EXIT_BAD_INPUT;
    }
    if ((error as NodeJS.ErrnoException).code === 'ENOENT' || (error as NodeJS.ErrnoException).code === 'EISDIR') {
      err(`${runPath}:1:1: FILE_UNREADABLE ${(error as Error).message}\n`);
      return EXIT_BAD_INPUT;
    }
    err(`reduce: ${(error as Error).stack ?? String(error)}\n`);
    return 1;
  }
}

/** The reader's messages start with `file:line:column` and end with `[CODE]`; print each once. */
function stripLocation(message: string): string {
  return message.replace(/^.*?:\d+:\d+:\s*/, '').replace(/\s*\[[A-Z_]+\]$/, '');
}

// Run when started as a script, not when imported by a test.
if (import.meta.url === `file://${process.argv[1]}` || process.argv[1]?.endsWith('reduce-cli.ts')) {
  // A reader that stops early (`| head`) closes the pipe; that is not a failure of the reduction.
  process.stdout.on('error', (error: NodeJS.ErrnoException) => {
    if (error.code !== 'EPIPE') throw error;
    process.exit(0);
  });
  const status = await runReduceCli(process.argv.slice(2), (t) => process.stdout.write(t), (t) => process.stderr.write(t));
  process.exitCode = status;
}
