/**
 * The `railwise` command. `run` takes the arguments and an output sink and returns the exit status,
 * so tests can call it directly; bin/railwise.mjs wires it to the process.
 */
import { parseCheckArgs, parseExportArgs } from './args.ts';
import { BlockingWriter } from './blockingWrite.ts';
import { parseCompareArgs } from './compareArgs.ts';
import { checkCommand } from './checkCommand.ts';
import { colourWanted } from './colour.ts';
import { compareCommand } from './compareCommand.ts';
import { exportCommand } from './exportCommand.ts';
import { brief } from '../core/text/printable.ts';
import { own } from '../core/model/records.ts';
import {
  CHECK_HELP,
  COMPARE_HELP,
  EXIT_OK,
  EXIT_UNUSABLE,
  EXPORT_HELP,
  MAIN_HELP,
  UsageError,
} from './usage.ts';

export interface Io {
  readonly out: (text: string) => void;
  readonly err: (text: string) => void;
  readonly colour: boolean;
}

/**
 * Runs one command. Every failure becomes exit status 2 with a message on standard error; with
 * `--json`, standard output then holds one JSON document `{"error": {"message"}}` unless the report
 * itself was already written (it then carries the error), so the output always parses.
 */
export async function run(argv: readonly string[], io: Io = processIo()): Promise<number> {
  let wrote = false;
  const tracked: Io = { ...io, out: (text) => ((wrote = true), io.out(text)) };
  const json = (argv[0] === 'check' || argv[0] === 'compare') && argv.includes('--json');
  try {
    return await dispatch(argv, tracked);
  } catch (e) {
    const usage = e instanceof UsageError;
    const message = usage
      ? e.message
      : `internal error (please report it): ${e instanceof Error ? (e.stack ?? e.message) : String(e)}`;
    io.err(`railwise: ${brief(message, 4000)}${usage ? '\nSee railwise --help.' : ''}`);
    if (json && !wrote) io.out(JSON.stringify({ error: { message: brief(message, 4000) } }, null, 2));
    return EXIT_UNUSABLE;
  }
}

async function dispatch(argv: readonly string[], io: Io): Promise<number> {
  const [command, ...rest] = argv;
  switch (command) {
    case 'check': {
      const args = parseCheckArgs(rest);
      if (args.help) return help(io, CHECK_HELP);
      return await checkCommand(args, io);
    }
    case 'export': {
      const args = parseExportArgs(rest);
      if (args.help) return help(io, EXPORT_HELP);
      return exportCommand(args, io);
    }
    case 'compare': {
      const args = parseCompareArgs(rest);
      if (args.help) return help(io, COMPARE_HELP);
      return compareCommand(args, io);
    }
    case 'help':
      return help(io, own(HELP, rest[0] ?? '') ?? MAIN_HELP);
    case undefined:
    case '--help':
    case '-h':
      return help(io, MAIN_HELP);
    default:
      throw new UsageError(`unknown command "${command}": use check, compare or export`);
  }
}

const HELP: Readonly<Record<string, string>> = {
  check: CHECK_HELP,
  compare: COMPARE_HELP,
  export: EXPORT_HELP,
};

function help(io: Io, text: string): number {
  io.out(text.trimEnd());
  return EXIT_OK;
}

function processIo(): Io {
  const stdout = new BlockingWriter(process.stdout.fd);
  return {
    out: (text) => stdout.write(`${text}\n`),
    err: (text) => void process.stderr.write(`${text}\n`),
    colour: colourWanted(process.stdout.isTTY === true, process.env),
  };
}
