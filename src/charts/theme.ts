/**
 * The coppice house look, applied to every chart: one place for colours, font, title style and sizes.
 *
 * Design notes:
 * - Plain white ground, no frame around the plot, dotted horizontal guides only, left-aligned titles
 *   with a muted subtitle, legends above the plot so the plot keeps the full notebook width (~700 px).
 * - Font: Liberation Sans first, which has the same glyph widths as Arial, so label layout measured on
 *   one machine holds on others; then Arial/Helvetica and the generic sans-serif.
 * - Series colours ("woodland" set) were chosen for this project and tuned so that every pair stays at
 *   least 25 CIELAB units apart for normal vision and under simulated protanopia, deuteranopia and
 *   tritanopia, and every colour has at least 3:1 contrast against white (WCAG 2.1, success
 *   criterion 1.4.11, non-text contrast). `test/charts/theme.test.ts` checks both.
 */
import type { Config } from 'vega-lite';

/** Series colours, in the order series receive them. */
export const SERIES_COLOURS: readonly string[] = [
  '#2d2a9b', // indigo
  '#e37908', // amber
  '#399ae6', // sky
  '#146e2d', // forest
  '#8e6b81', // heather
  '#4e152d', // wine
];

/** Named roles used across charts, so one meaning keeps one colour everywhere. */
export const ROLE = {
  /** Main series / model / "kept". */
  primary: SERIES_COLOURS[0],
  /** Second series / comparison / "pruned" / increase. */
  accent: SERIES_COLOURS[1],
  /** Something got better. */
  better: SERIES_COLOURS[3],
  /** Something got worse. */
  worse: SERIES_COLOURS[1],
  /** Pushes a prediction up. */
  up: SERIES_COLOURS[1],
  /** Pushes a prediction down. */
  down: SERIES_COLOURS[0],
  /** Reference lines (diagonals, zero lines, chosen settings). */
  reference: '#5f6673',
  /** Individual points drawn behind a summary. */
  faint: '#9aa1ad',
  /** Text drawn on the plot. */
  ink: '#1b2430',
  /** Muted text. */
  muted: '#5b6472',
  /** Amber darkened for text: 5:1 contrast on white, where amber itself has 3:1 (WCAG 2.1 asks 4.5:1 for text). */
  accentText: '#a85a00',
} as const;

/** Sequential ramp for heat maps (light to dark, interpolated in CIELAB). */
export const SEQUENTIAL_RAMP: readonly string[] = ['#f6f4ec', '#c9d3e6', '#7d8fcb', '#2d2a9b', '#15124d'];

/** Background bands for status levels (e.g. drift): calm, watch, act. */
export const BAND_COLOURS = { calm: '#e3efe6', watch: '#fbe9cf', act: '#f6d3cf' } as const;

/** Font stack for all text. */
export const FONT = '"Liberation Sans", Arial, Helvetica, sans-serif';

/** Default plot area in pixels: about 700 px wide with axes and padding. */
export const SIZE = { width: 560, height: 300 } as const;

/**
 * The vega-lite config every chart carries (axes, legends, titles, colours and font of the house look).
 * @example
 * const spec = { ...chartImportance(rows), config: houseConfig() }; // what every chart already does
 */
export function houseConfig(): Config {
  const axisCommon = {
    labelColor: '#4a5260',
    labelFontSize: 11,
    titleColor: '#2b3340',
    titleFontSize: 12,
    titleFontWeight: 'normal' as const,
    titlePadding: 8,
    domainColor: '#8a8f98',
    tickColor: '#8a8f98',
    tickSize: 4,
    gridColor: '#e3e6eb',
    gridDash: [2, 3],
    labelOverlap: true,
  };
  return {
    font: FONT,
    background: '#ffffff',
    padding: 12,
    view: { stroke: null, continuousWidth: SIZE.width, continuousHeight: SIZE.height },
    title: {
      anchor: 'start',
      fontSize: 15,
      fontWeight: 'bold',
      color: ROLE.ink,
      subtitleFontSize: 12,
      subtitleColor: ROLE.muted,
      subtitlePadding: 4,
      offset: 14,
    },
    axis: axisCommon,
    axisX: { grid: false },
    axisY: { grid: true, domain: false },
    axisBand: { grid: false, domain: false, ticks: false },
    legend: {
      orient: 'top',
      direction: 'horizontal',
      titleOrient: 'left',
      titleFontSize: 11,
      titleColor: '#2b3340',
      titleFontWeight: 'normal',
      labelFontSize: 11,
      labelColor: '#4a5260',
      symbolSize: 90,
      symbolStrokeWidth: 2.5,
      columnPadding: 14,
      offset: 8,
    },
    header: { labelFontSize: 12, labelColor: ROLE.ink, titleFontSize: 12, titleColor: ROLE.ink },
    range: { category: [...SERIES_COLOURS], ramp: [...SEQUENTIAL_RAMP] },
    line: { strokeWidth: 2.2, strokeCap: 'round', strokeJoin: 'round' },
    point: { size: 40, filled: true, opacity: 1 },
    bar: { cornerRadiusEnd: 2 },
    rule: { color: ROLE.reference },
    text: { fontSize: 11, color: ROLE.ink },
    concat: { spacing: 22 },
  };
}
