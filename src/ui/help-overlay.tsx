import React from 'react';
import { Box } from 'ink';
import { KEY_TABLE, bindingKeys, keysFor, type KeyContext } from './keys.js';
import type { ShownLine } from './review-step.js';
import { wrap } from '../report/wrap.js';
import { STATIONS_SYNTAX } from '../interview/read-stations.js';
import { POINTS_SYNTAX } from '../interview/read-points.js';
import { FILE_SYNTAX } from '../interview/read-points-file.js';
import { ScrollView } from './scroll-view.js';
import { TONE } from './theme.js';

const PLACES: Record<KeyContext, string> = {
  home: 'case list',
  question: 'questions',
  choice: 'questions',
  review: 'review',
  jump: 'go-to list',
  help: 'this list',
  path: 'file name',
  conflict: 'changed-file choice',
  'report-form': 'report form choice',
};

const ALL = Object.keys(PLACES).filter((k) => k !== 'help') as KeyContext[];

/**
 * The help as lines: every binding of the key table with its keys, what it does and where it
 * works, then the quick-entry syntax. Built from the table, so it can never disagree with it.
 */
export function helpLines(width: number, quickEntry: readonly string[]): ShownLine[] {
  const out: ShownLine[] = [{ text: 'Keys', bold: true, tone: 'heading' }];
  const keyW = Math.max(...KEY_TABLE.map((b) => bindingKeys(b).length)) + 2;
  for (const b of KEY_TABLE) {
    const places: KeyContext[] = b.when.filter((w) => w !== 'help');
    const everywhere = ALL.every((w) => places.includes(w));
    const where = everywhere ? 'everywhere' : [...new Set(places.map((w) => PLACES[w]))].join(', ');
    const body = wrap(`${b.description} · ${where}`, Math.max(20, width - keyW));
    body.forEach((l, i) =>
      out.push({ text: (i === 0 ? bindingKeys(b).padEnd(keyW) : ' '.repeat(keyW)) + l }),
    );
  }
  out.push({ text: '' }, { text: 'Quick entry', bold: true, tone: 'heading' });
  // These lines are laid out by hand (aligned columns): keep their spacing, wrap only when too wide.
  for (const q of quickEntry) {
    if (q.length <= width) out.push({ text: q });
    else {
      const indent = /^\s*/.exec(q)![0];
      for (const l of wrap(q, width - indent.length - 2)) out.push({ text: indent + l });
    }
  }
  out.push({ text: '' }, { text: 'Offsets of a yaw mark', bold: true, tone: 'heading' });
  for (const l of wrap(
    `When the radius is measured by offsets along one chord, type the ${STATIONS_SYNTAX}: the distance along the chord from its start, then the offset from the chord to the mark. A unit may be glued to a number (3.1m:0.12m).`,
    Math.max(20, width),
  ))
    out.push({ text: l });
  out.push({ text: '' }, { text: 'Surveyed points of a yaw mark', bold: true, tone: 'heading' });
  for (const l of [
    `At "How was the radius of the mark measured?" press p (surveyed points). Paste the points as exported, ${POINTS_SYNTAX}: the pasted lines stay one answer, and Enter reads them. A unit may be glued to a number (12.5m).`,
    `Or read a CSV file: ${FILE_SYNTAX}. The header's unit (x_m, E (ft)) is used; without one the numbers are in the case's unit, and the notice says so.`,
    'The notice gives the fitted radius, the RMS residual and the largest residual with its point number. The next question, Points to leave out, takes point numbers (1, 12-14) to fit without them, e.g. where the mark turns into a scuff; they are kept in the case file as pointsLeftOut.',
  ].flatMap((t) => wrap(t, Math.max(20, width))))
    out.push({ text: l });
  out.push({ text: '' }, { text: 'A vehicle that left the ground', bold: true, tone: 'heading' });
  for (const l of wrap(
    'At "What do the marks look like?" press j (take-off and landing marks). Give the horizontal distance of the centre of mass from take-off to first landing, its drop (+ landed lower, - landed higher) and the take-off slope (signed percent or degrees; empty is level), each with a tolerance. Example (invented): 62 ± 2 ft, 8.5 ± 0.5 ft, -2 ± 1 % gives 62.9 mph (56.6 to 71.0).',
    Math.max(20, width),
  ))
    out.push({ text: l });
  out.push(
    { text: '' },
    { text: 'A slide that ran on into more marks', bold: true, tone: 'heading' },
  );
  for (const l of wrap(
    'At "How did the slide end?" press o (went on into the next set of marks), then pick the analysis that holds them, or the next one to be entered. Example (invented): a 38 ft slide into a yaw entered as analysis 2: the slide starts from the yaw\'s speed, and the review shows the phases in order. A loop is refused, naming it.',
    Math.max(20, width),
  ))
    out.push({ text: l });
  out.push(
    { text: '' },
    { text: `${keysFor('close')} or ${keysFor('help')} closes this list.`, tone: 'muted' },
  );
  return out;
}

/** The help overlay: a bordered, scrollable list of every key. */
export function HelpOverlay(props: {
  width: number;
  height: number;
  top: number;
  /** `helpLines(width - 4, quickEntry)`, built by the caller once per width. */
  lines: ShownLine[];
}) {
  const { lines } = props;
  return (
    <Box
      flexDirection="column"
      borderStyle="round"
      borderColor={TONE.heading}
      paddingX={1}
      width={props.width}
    >
      <ScrollView lines={lines} top={props.top} height={props.height - 2} />
    </Box>
  );
}
