import type { AnalysisSolution } from '../engine/types.js';
import type { SensitivityRow } from '../extras/sensitivity.js';
import { profileOf, speedAlong } from './slide-profile.js';
import { arcOffset } from './yaw-sketch.js';
import { line, px, svgDocument, text } from './svg.js';
import { changeText } from './sensitivity-bars.js';
import { num } from './text-fit.js';

export interface SvgOptions {
  width?: number;
  height?: number;
  speedUnit?: string;
  lengthUnit?: string;
  segmentLabels?: readonly string[];
}

const unitSuffix = (u: string | undefined) => (u ? ` ${u}` : '');

/**
 * The speed along a slide as a self-contained SVG (default 640 × 320): the curve from the start
 * of the marks to their end (S² linear in distance on each segment), a dashed line and the speed
 * at each boundary, distances under the axis and each segment's surface under its stretch.
 * @example speedAlongSlideSvg(solution, { segmentLabels: ['asphalt'], speedUnit: 'mph', lengthUnit: 'ft' })
 */
export function speedAlongSlideSvg(solution: AnalysisSolution, opts: SvgOptions = {}): string {
  const W = opts.width ?? 640;
  const H = opts.height ?? 320;
  const title = 'Speed along the slide';
  const b = profileOf(solution);
  if (!b)
    return svgDocument(W, H, title, [
      text(W / 2, H / 2, 'No speed profile for this analysis', 'middle'),
    ]);
  const L = 60,
    R = 20,
    T = 30,
    B = 60;
  const total = b[b.length - 1]!.at;
  const top = Math.max(...b.map((x) => x.speed.value));
  const X = (x: number) => L + (x / total) * (W - L - R);
  const Y = (s: number) => T + (1 - s / top) * (H - T - B);
  const su = unitSuffix(opts.speedUnit);
  const lu = unitSuffix(opts.lengthUnit);
  const pts: string[] = [];
  for (let i = 0; i <= 200; i++) {
    const x = (i / 200) * total;
    pts.push(`${px(X(x))},${px(Y(speedAlong(b, x)))}`);
  }
  const body = [
    text(
      L,
      18,
      `${title} (speed${su} against distance from the start of the marks${lu})`,
      'start',
      13,
    ),
    line(L, T, L, Y(0)),
    line(L, Y(0), W - R, Y(0)),
    text(L - 6, Y(top) + 4, num(top, 1), 'end'),
    text(L - 6, Y(0) + 4, '0', 'end'),
    `<polyline points="${pts.join(' ')}" fill="none" stroke="#000" stroke-width="2"/>`,
  ];
  b.forEach((x, j) => {
    if (j > 0) body.push(line(X(x.at), T, X(x.at), Y(0), true));
    body.push(`<circle cx="${px(X(x.at))}" cy="${px(Y(x.speed.value))}" r="3" fill="#000"/>`);
    body.push(
      text(
        X(x.at) + (j === b.length - 1 ? -4 : 4),
        Y(x.speed.value) - 6,
        `${num(x.speed.value, 1)}${su}`,
        j === b.length - 1 ? 'end' : 'start',
      ),
    );
    body.push(
      text(
        X(x.at),
        Y(0) + 16,
        `${num(x.at, 1)}${j === b.length - 1 ? lu : ''}`,
        j === 0 ? 'start' : j === b.length - 1 ? 'end' : 'middle',
      ),
    );
  });
  for (let j = 0; j + 1 < b.length; j++)
    body.push(
      text(
        (X(b[j]!.at) + X(b[j + 1]!.at)) / 2,
        Y(0) + 36,
        opts.segmentLabels?.[j] ?? `segment ${j + 1}`,
        'middle',
      ),
    );
  return svgDocument(W, H, title, body);
}

/**
 * A yaw mark's arc as a self-contained SVG (default 640 × 240): chord, arc and middle ordinate,
 * labelled, with the height stretched to be visible (the stretch is stated under the chord).
 * @example yawArcSvg(45, 3.2, { lengthUnit: 'ft' })
 */
export function yawArcSvg(C: number, M: number, opts: SvgOptions = {}): string {
  const W = opts.width ?? 640;
  const H = opts.height ?? 240;
  const title = 'Yaw mark: chord and middle ordinate';
  if (!(Number.isFinite(C) && Number.isFinite(M) && C > 0 && M > 0 && M < C / 2))
    return svgDocument(W, H, title, [
      text(
        W / 2,
        H / 2,
        'No arc: the middle ordinate must be above 0 and below half the chord',
        'middle',
      ),
    ]);
  const L = 30,
    R = 30,
    T = 30,
    B = 60;
  const sx = (W - L - R) / C;
  const sy = Math.min(sx * 8, (H - T - B) / M);
  const base = H - B;
  const X = (x: number) => L + x * sx;
  const Y = (y: number) => base - y * sy;
  const lu = unitSuffix(opts.lengthUnit);
  const pts: string[] = [];
  for (let i = 0; i <= 200; i++) {
    const x = (i / 200) * C;
    pts.push(`${px(X(x))},${px(Y(arcOffset(C, M, x)))}`);
  }
  const body = [
    text(L, 18, title, 'start', 13),
    `<polyline points="${pts.join(' ')}" fill="none" stroke="#000" stroke-width="2"/>`,
    line(X(0), base, X(C), base),
    line(X(C / 2), base, X(C / 2), Y(M), true),
    text(X(C / 2) + 6, (base + Y(M)) / 2 + 4, `M ${num(M, 2)}${lu}`),
    text(X(C / 2), base + 18, `chord C ${num(C, 2)}${lu}`, 'middle'),
  ];
  const stretch = sy / sx;
  if (stretch > 1.5)
    body.push(
      text(X(C / 2), base + 38, `height drawn ${num(stretch, 1)}× the length scale`, 'middle', 11),
    );
  return svgDocument(W, H, title, body);
}

/**
 * The sensitivity rows as a self-contained SVG bar chart (default 640 wide, 36 px a row): for each
 * input a bar left of the axis for the speed's drop and right of it for its rise, with the numbers.
 * @example sensitivitySvg(sensitivity(solution), { speedUnit: 'mph' })
 */
export function sensitivitySvg(rows: readonly SensitivityRow[], opts: SvgOptions = {}): string {
  const W = opts.width ?? 640;
  const rowH = 36;
  const H = opts.height ?? 60 + rowH * Math.max(1, rows.length);
  const title = 'Sensitivity: change in speed with each input at its ends';
  if (rows.length === 0)
    return svgDocument(W, H, title, [text(W / 2, H / 2, 'No input has a range', 'middle')]);
  const labelW = 220,
    figW = 130;
  const axis = labelW + (W - labelW - figW) / 2;
  const half = (W - labelW - figW) / 2 - 10;
  const scale = Math.max(...rows.map((r) => Math.max(-r.down, r.up))) || 1;
  const su = unitSuffix(opts.speedUnit);
  const body = [text(10, 20, title, 'start', 13), line(axis, 32, axis, 40 + rowH * rows.length)];
  rows.forEach((r, i) => {
    const y = 40 + i * rowH;
    const dn = (-r.down / scale) * half;
    const up = (r.up / scale) * half;
    body.push(text(10, y + 20, r.label));
    body.push(
      `<rect x="${px(axis - dn)}" y="${px(y + 8)}" width="${px(dn)}" height="18" fill="#888"/>`,
    );
    body.push(`<rect x="${px(axis)}" y="${px(y + 8)}" width="${px(up)}" height="18" fill="#333"/>`);
    body.push(text(W - 10, y + 20, changeText(r) + su, 'end'));
  });
  return svgDocument(W, H, title, body);
}

/** One phase of a chain as the picture names it: what it is, and the speed where it begins. */
export interface PhaseBox {
  /** `skid-1, slide` */
  name: string;
  /** `50.2 mph (48.6 to 51.8)` */
  speed: string;
}

/**
 * The phases of a chain in order of travel as a self-contained SVG (default 640 wide): one box a
 * phase, an arrow from each to the next, and under each box's left edge the speed where that
 * phase begins (the speed at the junction with the one before). The labels come formatted.
 * @example phasesSvg([{ name: 'skid-1, slide', speed: '50.2 mph' }, { name: 'yaw-1, critical speed', speed: '41.0 mph' }])
 */
export function phasesSvg(phases: readonly PhaseBox[], opts: SvgOptions = {}): string {
  const W = opts.width ?? 640;
  const H = opts.height ?? 150;
  const title = 'Phases in order of travel';
  const n = Math.max(1, phases.length);
  const L = 20,
    R = 20,
    gap = 36,
    top = 40,
    boxH = 40;
  const boxW = (W - L - R - gap * (n - 1)) / n;
  const body = [text(L, 18, title, 'start', 13)];
  phases.forEach((p, k) => {
    const x = L + k * (boxW + gap);
    body.push(
      `<rect x="${px(x)}" y="${top}" width="${px(boxW)}" height="${boxH}" fill="#eee"/>`,
      line(x, top, x + boxW, top),
      line(x, top + boxH, x + boxW, top + boxH),
      line(x, top, x, top + boxH),
      line(x + boxW, top, x + boxW, top + boxH),
      text(x + boxW / 2, top + boxH / 2 + 4, p.name, 'middle', 11),
      // the speed where this phase begins, at its left edge
      line(x, top + boxH, x, top + boxH + 14, true),
      text(x, top + boxH + 28, `begins ${p.speed}`, 'start', 11),
    );
    if (k < phases.length - 1) {
      const ax = x + boxW + 4;
      const bx = x + boxW + gap - 4;
      const y = top + boxH / 2;
      body.push(
        line(ax, y, bx, y),
        `<polyline points="${px(bx - 7)},${px(y - 4)} ${px(bx)},${px(y)} ${px(bx - 7)},${px(y + 4)}" fill="none" stroke="#000" stroke-width="1"/>`,
      );
    }
  });
  return svgDocument(W, H, title, body);
}
