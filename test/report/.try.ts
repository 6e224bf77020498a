import { readFileSync } from 'node:fs';
import { loadCaseText } from '../work/main/src/case/load.js';
import { solveCase } from '../work/main/src/engine/index.js';
import { buildReport } from '../work/main/src/report/build.js';
import { renderText } from '../work/main/src/report/render-text.js';
import { renderMarkdown } from '../work/main/src/report/render-markdown.js';
const f = process.argv[2]!;
const r = loadCaseText(readFileSync(f, 'utf8'));
if (!r.ok) {
  console.log(r.issues);
  process.exit(1);
}
const sol = solveCase(r.case);
const doc = buildReport(r.case, sol, {
  toolVersion: '0.1.0',
  generatedAt: '2026-12-01T22:00:00Z',
  caseFile: f,
  extras: { sampling: {} },
});
console.log(process.argv[3] === 'md' ? renderMarkdown(doc) : renderText(doc));
