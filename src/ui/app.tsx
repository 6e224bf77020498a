import React, { useEffect, useMemo, useState } from 'react';
import { Box, useApp, useStdout } from 'ink';
import type { InterviewPort } from './interview-port.js';
import type { Services } from './services.js';
import { useAppModel, type Start } from './use-app-model.js';
import { contextOf, useAppInput } from './use-app-input.js';
import { HomeScreen } from './home-screen.js';
import { Header } from './header.js';
import { InterviewScreen } from './interview-screen.js';
import { ReviewScreen } from './review-screen.js';
import { HelpOverlay } from './help-overlay.js';
import { JumpList } from './jump-list.js';
import { Footer } from './footer.js';
import { ReadOnlyBanner } from './read-only-banner.js';
import { filterQuestions } from './jump-filter.js';
import { reviewLines, type ShownLine } from './review-lines.js';

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
    const on = () => redraw((n) => n + 1);
    stdout.on('resize', on);
    return () => void stdout.off('resize', on);
  }, [stdout]);
  return { width: columns ?? stdout.columns ?? 80, height: rows ?? stdout.rows ?? 24 };
}

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
  const footerRows = width < 70 ? 3 : 2;
  const banner = s?.open.readOnly ? 2 : 0;
  const body = height - footerRows - banner - (s ? 2 : 0);

  const review = useMemo((): ShownLine[] => {
    if (!s || question) return [];
    const built = port.build(s.state, s.open.case);
    if (!built.ok) return [{ text: `The case is not complete yet: ${built.message}`, tone: 'warning' }];
    return reviewLines(port.solve(built.case), width);
  }, [s?.state, question, width]);

  const onReport = () => {
    if (!s) return;
    const built = port.build(s.state, s.open.case);
    if (!built.ok) return;
    void props.services.writeReport(s.open, built.case).then((r) => {
      const reportMessage = r.ok ? `Report written to ${r.path}` : `No report written: ${r.message}`;
      app.update((m) => (m.session ? { ...m, session: { ...m.session, reportMessage } } : m));
    });
  };
  useAppInput({ app, port, services: props.services, page: Math.max(1, body - 3), onReport });

  const ctx = contextOf(app, port);
  const overlay = model.overlay;
  let main: React.ReactNode;
  if (overlay?.kind === 'help') {
    main = <HelpOverlay width={width} height={body + (s ? 2 : 0)} top={overlay.top} quickEntry={props.quickEntry} />;
  } else if (overlay?.kind === 'jump' && s) {
    const matches = filterQuestions(port.states(s.state), overlay.filter.value);
    main = <JumpList matches={matches} filter={overlay.filter} selected={overlay.selected} width={width} height={body} color={props.color} />;
  } else if (s && question) {
    main = (
      <InterviewScreen
        session={s}
        question={question}
        defaultText={port.defaultText(s.state)}
        explain={question.explainChoice?.(s.state.answers)}
        draft={port.draft(s.state, s.open.case)}
        width={width}
        height={body - 1}
        color={props.color}
      />
    );
  } else if (s) {
    main = <ReviewScreen lines={review} top={s.reviewTop} height={body} message={s.reportMessage} />;
  } else {
    main = <HomeScreen {...model.home} rows={model.home.rows} sessionsDir={props.services.sessionsDir} sessionsFrom={props.services.sessionsFrom} height={body} color={props.color} />;
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
          saveError={s.saveError}
          readOnly={!!s.open.readOnly}
        />
      ) : null}
      {main}
      <Footer context={ctx} note={model.leaving ? 'Saving and leaving…' : undefined} />
    </Box>
  );
}
