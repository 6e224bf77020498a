// Key press to repainted frame, through the pty, on a case with 20 segments.
import { existsSync } from 'node:fs';
import { join } from 'node:path';

export async function keypress(ctx) {
  const figure = 'key press to frame, 20 segments (p95)';
  if (!existsSync(join(ctx.root, 'src/ui/run.tsx')))
    return { figure, available: false, note: 'src/ui/run.tsx (the interactive entry) does not exist yet' };
  return { figure, available: false, note: 'measurement not wired yet' };
}
