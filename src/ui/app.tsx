import React, { useEffect, useMemo, useState } from 'react';
import { Box, useApp, useStdout } from 'ink';
import type { InterviewPort } from './interview-port.js';
import type { Services } from './services.js';
import type { ReportFormat } from '../report/render.js';
import { useAppModel, type Start } from './use-app-model.js';
import { contextOf, useAppInput } from './use-app-input.js';
import { HomeScreen } from './home-screen.js';
import { Header } from './header.js';
import { InterviewScreen } from './interview-screen.js';
import { ReviewScreen, reviewMessageLines } from './review-screen.js';
import { HelpOverlay, helpLines } from './help-overlay.js';
import { JumpList } from './jump-list.js';
import { Footer } from './footer.js';
import { ReadOnlyBanner } from './read-only-banner.js';
import { filterQuestions } from './jump-filter.js';
import { reviewLinesOf } from './review-lines.js';
import type { ShownLine } from './review-step.js';
import { isChoice } from './question-view.js';
import type { Question } from '../interview/types.js';
import type { Command } from './keys.js';
import { reviewFigures, type ReviewContext, type ReviewFigures } from './review-extras.js';
import { DEFAULT_REACTION_TIME, REACTION_TIMES } from '../engine/constants.js';

export interface AppProps {
  services: Services;
  port: InterviewPort;
  start: Start;
  color: boolean;
  quickEntry: readonly string[];
  /** Fixed size (tests); otherwise the terminal's, following resizes. */
  columns?: number;
  rows?: number;
  onExit(code: number): void;
}

function useSize(columns?: number, rows?: number) {
  const { stdout } = useStdout();
  const [, redraw] = useState(0);
  useEffect(() => {
    // A terminal that changes width re-wraps the frame on screen, so Ink's erase (which counts the
    // lines it wrote, not the rows they now take) would leave a stale copy. Clearing the screen just
    // before the app re-lays itself out for the new width lets Ink paint the frame onto a clean screen.
    const on = () => {
      stdout.write('\u001b[2J\u001b[3J\u001b[H');
      redraw((n) => n + 1);
    };
    stdout.on('resize', on);
    return () => void stdout.off('resize', on);
  }, [stdout]);
  // One row spare: a frame as tall as the terminal makes Ink redraw by scrolling.
  return { width: columns ?? stdout.columns ?? 80, height: (rows ?? stdout.rows ?? 24) - 1 };
}

/**
 * A choice's default is shown by its label, as the list shows it; a question that keeps a
 * preference when left empty shows the preference's value and where that value comes from.
 */
function shownDefault(
  q: Question,
  text: string | undefined,
  reactionTime: number | undefined,
): string | undefined {
  if (q.usesPreference === 'reactionTime') {
    const t = reactionTime ?? DEFAULT_REACTION_TIME;
    return `your preference, ${t} s (${REACTION_TIMES.surprise} s: surprise event, M. Green 2000; ${REACTION_TIMES.design} s: AASHTO design)`;
  }
  if (text === undefined || !isChoice(q)) return text;
  return q.choices!.find((c) => c.value === text)?.label ?? text;
}

/** The footer's left-out keys, fixed arrays so the memoised footer sees the same props. */
const NO_SUBMIT: readonly Command[] = ['submit'];
const NOTHING_LEFT_OUT: readonly Command[] = [];

/** The whole program on screen: home, a case's questions, its review, and the overlays. */
export function App(props: AppProps) {
  const { exit } = useApp();
  const { width: cols, height } = useSize(props.columns, props.rows);
  // One column spare: some terminals wrap a line that fills the last column.
  const width = Math.max(40, cols - 1);
  const app = useAppModel(props.services, props.port, props.start, (code) => {
    props.onExit(code);
    exit();
  });
  const { model } = app;
  const s = model.session;
  const port = props.port;
  const question = s ? port.current(s.state) : undefined;
  // The footer is one line at any width; one more while leaving (the note).
  const footerRows = model.leaving ? 2 : 1;
  const banner = s?.open.readOnly ? 2 : 0;
  // A note from the last save wraps: its rows come off the body (the wrap breaks at spaces, so
  // one row more than the plain division is allowed for).
  const noteRows = s?.saveNote ? Math.ceil(s.saveNote.length / width) + 1 : 0;
  const body = height - footerRows - banner - (s ? 2 : 0) - noteRows;

  // The heavy part (solve, sampling, the limit comparison, sensitivity) runs once per change of
  // the answers; a resize or any other render only lays the lines out again.
  const onReview = !!s && !question;
  const reactionTime = props.services.reactionTime;
  const figures = useMemo((): ReviewFigures | string | undefined => {
    if (!s || !onReview) return undefined;
    const built = port.build(s.state, s.open.case);
    if (!built.ok) return built.message;
    const ctx: ReviewContext = { case: built.case, notes: port.notes(s.state) };
    if (reactionTime !== undefined) ctx.reactionTime = reactionTime;
    return reviewFigures(port.solve(built.case), ctx);
    // eslint-disable-next-line react-hooks/exhaustive-deps -- keyed on the answers, not the whole session: a scroll, a resize or a typed key must not recompute (test/ui/review-once.test.tsx); `port` is fixed for the life of the app
  }, [s?.state.answers, s?.open.case, onReview, reactionTime]);
  const review = useMemo((): ShownLine[] => {
    if (figures === undefined) return [];
    if (typeof figures === 'string')
      return [{ text: `The case is not complete yet: ${figures}`, tone: 'warning' }];
    return reviewLinesOf(figures, width);
  }, [figures, width]);

  // The running chain only changes with the answers, not with each key typed.
  const draft = useMemo(
    () => (s && question ? port.draft(s.state, s.open.case) : undefined),
    // eslint-disable-next-line react-hooks/exhaustive-deps -- keyed on the answers, not the whole session: a scroll, a resize or a typed key must not recompute (test/ui/review-once.test.tsx); `port` is fixed for the life of the app
    [s?.state.answers, question?.id],
  );

  const onReport = (form?: ReportFormat) => {
    // Read at the moment of the key, not from this render: a key may arrive before the next one.
    const s = app.current().session;
    if (!s) return;
    const built = port.build(s.state, s.open.case);
    if (!built.ok) return;
    const say = (reportMessage: string, choosingReport = false) =>
      app.update((m) =>
        m.session ? { ...m, session: { ...m.session, reportMessage, choosingReport } } : m,
      );
    if (form === undefined)
      return say('Write the report as which form? Its keys are below; Enter takes Markdown.', true);
    say('Writing the report…');
    props.services.writeReport(s.open, built.case, form).then(
      (r) => say(r.ok ? `Report written to ${r.path}` : `No report written: ${r.message}`),
      (e: unknown) => say(`No report written: ${e instanceof Error ? e.message : String(e)}`),
    );
  };
  // The help's lines change only with the width: built once per width, not on every key.
  const help = useMemo(() => helpLines(width - 4, props.quickEntry), [width, props.quickEntry]);
  // Window heights as ReviewScreen and HelpOverlay lay them out (title, border, position line).
  const reviewWindow = body - 1 - reviewMessageLines(s?.reportMessage, width).length;
  const helpWindow = body + (s ? 2 : 0) - 3;
  const maxTop = {
    review: Math.max(0, review.length - reviewWindow),
    help: Math.max(0, help.length - helpWindow),
  };
  useAppInput({
    app,
    port,
    services: props.services,
    page: Math.max(1, body - 3),
    maxTop,
    onReport,
  });

  const ctx = contextOf(app, port);
  const overlay = model.overlay;
  let main: React.ReactNode;
  if (overlay?.kind === 'help') {
    main = <HelpOverlay width={width} height={body + (s ? 2 : 0)} top={overlay.top} lines={help} />;
  } else if (overlay?.kind === 'jump' && s) {
    const matches = filterQuestions(port.states(s.state), overlay.filter.value);
    main = (
      <JumpList
        matches={matches}
        filter={overlay.filter}
        selected={overlay.selected}
        width={width}
        height={body}
        color={props.color}
      />
    );
  } else if (s && question) {
    main = (
      <InterviewScreen
        session={s}
        question={question}
        defaultText={shownDefault(question, port.defaultText(s.state), props.services.reactionTime)}
        explain={port.explain(s.state)}
        draft={draft!}
        width={width}
        height={body - 1}
        color={props.color}
      />
    );
  } else if (s) {
    main = (
      <ReviewScreen
        lines={review}
        top={s.reviewTop}
        height={body}
        width={width}
        message={s.reportMessage}
      />
    );
  } else {
    main = (
      <HomeScreen
        {...model.home}
        rows={model.home.rows}
        sessionsDir={props.services.sessionsDir}
        sessionsFrom={props.services.sessionsFrom}
        height={body}
        color={props.color}
      />
    );
  }
  const showHeader = s && overlay?.kind !== 'help';
  return (
    <Box flexDirection="column" width={width}>
      {s?.open.readOnly ? <ReadOnlyBanner reason={s.open.readOnly} /> : null}
      {showHeader ? (
        <Header
          caseId={s.open.case.id}
          reference={s.open.case.details?.reference}
          section={question?.section ?? 'Review'}
          progress={port.progress(s.state)}
          mode={model.mode}
          savedAt={s.savedAt}
          lastSaved={s.open.isNew ? undefined : s.open.case.updated}
          saveError={s.saveError}
          saveNote={s.saveNote}
          readOnly={!!s.open.readOnly}
        />
      ) : null}
      {main}
      <Footer
        context={ctx}
        width={width}
        omit={ctx === 'home' && model.home.rows?.length === 0 ? NO_SUBMIT : NOTHING_LEFT_OUT}
        note={model.leaving ? (s?.open.readOnly ? 'Leaving…' : 'Saving and leaving…') : undefined}
        readOnly={!!s?.open.readOnly}
      />
    </Box>
  );
}
