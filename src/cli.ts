/**
 * skidcase command line. `solve` and `report` load neither Ink nor React (they are dynamic imports
 * only on the interactive paths), so a scripted solve starts about as fast as node itself. The two
 * commonest starts (no arguments, and `solve FILE [--json]`) do not load commander either.
 */
import type { Command } from 'commander';

declare const __SKIDCASE_VERSION__: string;
const VERSION = typeof __SKIDCASE_VERSION__ === 'string' ? __SKIDCASE_VERSION__ : '0.0.0-dev';

const io = {
  out: (s: string) => process.stdout.write(s.endsWith('\n') ? s : `${s}\n`),
  err: (s: string) => process.stderr.write(s.endsWith('\n') ? s : `${s}\n`),
};

const NO_TTY = [
  'skidcase: the interview needs an interactive terminal, and this one is not (stdin or stdout is not a TTY).',
  'Without a terminal, work with case files directly:',
  '  skidcase solve FILE [--json]      the formula chain (or JSON) for a case file',
  '  skidcase report FILE [--out PATH] the case report',
  "  skidcase history FILE|ID          the case's trail of changes",
  'The case file format is in docs/case-file.md.',
].join('\n');

async function sessions(flag: string | undefined) {
  const [{ resolveSessionsDir }, { loadPrefs }] = await Promise.all([
    import('./store/index.js'),
    import('./prefs/prefs.js'),
  ]);
  const { prefs, warnings } = loadPrefs();
  for (const w of warnings) io.err(`skidcase: preferences: ${w}`);
  return { ...resolveSessionsDir({ flag, env: process.env, prefs, cwd: process.cwd() }), prefs };
}

type Start =
  | { kind: 'home' }
  | { kind: 'resume'; id?: string }
  | { kind: 'new' }
  | { kind: 'open'; path: string };

async function interactive(flag: string | undefined, start: Start): Promise<number> {
  if (!process.stdin.isTTY || !process.stdout.isTTY) {
    io.err(NO_TTY);
    return 1;
  }
  const where = await sessions(flag);
  const { runInteractive } = await import('./ui/run.js');
  return runInteractive({ sessionsDir: where.dir, sessionsFrom: where.from, start });
}

function program({ Command, Option }: typeof import('commander')): Command {
  const p = new Command('skidcase')
    .description(
      'Guided speed-from-tire-marks reconstruction: skid and yaw marks to a minimum speed with its range.',
    )
    .version(VERSION, '-V, --version')
    .option(
      '--sessions <dir>',
      'folder that holds the case files (default ./sessions, or SKIDCASE_SESSIONS)',
    )
    .showHelpAfterError()
    // A word that is no command reaches the root action: say so and list the commands, rather
    // than commander's "too many arguments".
    .allowExcessArguments()
    .action(async (_opts: unknown, cmd: Command) => {
      if (cmd.args.length > 0) {
        io.err(unknownCommand(cmd.args[0]!, p));
        return setExit(1);
      }
      setExit(await interactive(p.opts().sessions, { kind: 'home' }));
    });
  p.command('new')
    .description('start a new case')
    .action(async () => setExit(await interactive(p.opts().sessions, { kind: 'new' })));
  p.command('resume [id]')
    .description('carry on with a case (without ID: the most recently saved unfinished one)')
    .action(async (id?: string) =>
      setExit(
        await interactive(p.opts().sessions, id ? { kind: 'resume', id } : { kind: 'resume' }),
      ),
    );
  p.command('open <file>')
    .description('open a case file (for example a hand-written one) in the tool')
    .action(async (file: string) =>
      setExit(await interactive(p.opts().sessions, { kind: 'open', path: file })),
    );
  p.command('solve <file>')
    .description(
      'print the formula chain for a case file (exit 0 solved, 2 invalid file, 3 not computable)',
    )
    .option('--json', 'print the result as JSON')
    .action(async (file: string, o: { json?: boolean }) => {
      const { solveCommand } = await import('./commands/solve.js');
      setExit(await solveCommand(file, { json: Boolean(o.json) }, io));
    });
  p.command('report <case>')
    .description('write the case report for a case file or a case id in the sessions folder')
    .addOption(
      new Option('--format <format>', 'report format (pdf needs --out)')
        .choices(['md', 'txt', 'html', 'json', 'pdf'])
        .default('md'),
    )
    .addOption(
      new Option(
        '--paper <size>',
        'page size of a PDF (default: letter for an imperial case, a4 for a metric one)',
      ).choices(['a4', 'letter']),
    )
    .option(
      '--out <path>',
      'write to this file (never overwrites without --force) instead of standard output',
    )
    .option('--force', 'overwrite --out if it exists')
    .action(
      async (
        target: string,
        o: {
          format: 'md' | 'txt' | 'html' | 'json' | 'pdf';
          paper?: 'a4' | 'letter';
          out?: string;
          force?: boolean;
        },
      ) => {
        const where = await sessions(p.opts().sessions);
        const { reportCommand } = await import('./commands/report.js');
        const opts = {
          format: o.format,
          force: Boolean(o.force),
          sessionsDir: where.dir,
          reactionTime: where.prefs.reactionTime,
          ...(o.out ? { out: o.out } : {}),
          ...(o.paper ? { paper: o.paper } : {}),
        };
        setExit(await reportCommand(target, opts, io));
      },
    );
  p.command('history <case>')
    .description(
      'list the trail of changes of a case file or a case id: each revision, who made it, each field from → to',
    )
    .action(async (target: string) => {
      const where = await sessions(p.opts().sessions);
      const { historyCommand } = await import('./commands/history.js');
      setExit(await historyCommand(target, where.dir, io));
    });
  p.command('verify <report> [case]')
    .description(
      'say whether a report was made from a case file (exit 0 it was, 1 it differs, 2 unreadable)',
    )
    .action(async (report: string, target?: string) => {
      const where = await sessions(p.opts().sessions);
      const { verifyCommand } = await import('./commands/verify.js');
      setExit(await verifyCommand(report, target, where.dir, io));
    });
  return p;
}

/** "unknown command 'frobnicate'" with each command and what it does, from the program itself. */
function unknownCommand(word: string, p: Command): string {
  const cmds = p.commands.map((c) => [
    `${c.name()} ${c.usage().replace(/\[options\]\s*/, '')}`.trim(),
    c.description(),
  ]);
  const w = Math.max(...cmds.map(([u]) => u!.length));
  return [
    `skidcase: unknown command '${word}'. The commands are:`,
    ...cmds.map(([u, d]) => `  skidcase ${u!.padEnd(w)}  ${d}`),
    'Without a command, skidcase opens the list of cases. skidcase --help says more.',
  ].join('\n');
}

function setExit(code: number) {
  process.exitCode = code;
}

/**
 * The arguments that need no parser: none at all (the case list), and `solve FILE` with or
 * without `--json` (FILE not an option). They run exactly what commander's actions would run;
 * anything else, `--help` included, goes through commander.
 */
function fastPath(args: readonly string[]): (() => Promise<number>) | undefined {
  if (args.length === 0) return () => interactive(undefined, { kind: 'home' });
  if (args[0] !== 'solve' || args.length < 2 || args.length > 3) return undefined;
  const rest = args.slice(1);
  const json = rest.length === 2;
  if (json && !rest.includes('--json')) return undefined;
  const files = rest.filter((a) => a !== '--json');
  if (files.length !== 1 || files[0]!.startsWith('-')) return undefined;
  const file = files[0]!;
  return async () => {
    const { solveCommand } = await import('./commands/solve.js');
    return solveCommand(file, { json }, io);
  };
}

async function main() {
  const fast = fastPath(process.argv.slice(2));
  if (fast) return setExit(await fast());
  await program(await import('commander')).parseAsync(process.argv);
}

main().catch((e: unknown) => {
  // Only a programming error lands here; expected failures are exit codes with messages.
  io.err(`skidcase: internal error: ${e instanceof Error ? e.message : String(e)}`);
  process.exitCode = 70;
});
