/**
 * Runs the interactive screens from source, for trying them in tmux before src/cli.ts calls
 * runInteractive: `npx tsx test/ui/dev-run.tsx [sessions-dir] [new|resume|home]`.
 */
import { runInteractive } from '../../src/ui/run.js';

const dir = process.argv[2] ?? 'sessions';
const kind = process.argv[3] ?? 'home';
const start =
  kind === 'new'
    ? { kind: 'new' as const }
    : kind === 'resume'
      ? { kind: 'resume' as const }
      : { kind: 'home' as const };
const code = await runInteractive({ sessionsDir: dir, sessionsFrom: 'flag', start });
process.exit(code);
