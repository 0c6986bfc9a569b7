/**
 * The empty state: a chart with the usual title and a centred message instead of marks, for inputs with
 * nothing to draw (no rows), so a notebook cell still shows what was asked for and why it is blank.
 */
import { finishChart, plotSize, type ChartOptions, type ChartSpec } from './spec.js';
import { ROLE } from './theme.js';

/**
 * A chart that says there is nothing to draw.
 *
 * @param title   Title of the chart that would have been drawn.
 * @param message What is missing, in a sentence.
 * @param options Size and title overrides. __Default:__ the house size.
 * @example
 * chartEmpty('Learning curve', 'No rounds were recorded.');
 */
export function chartEmpty(title: string, message: string, options: ChartOptions = {}): ChartSpec {
  const { width } = plotSize(options);
  return finishChart(
    {
      width,
      height: 80,
      data: { values: [{ message }] },
      mark: { type: 'text', fontSize: 13, color: ROLE.muted, fontStyle: 'italic' },
      encoding: {
        text: { field: 'message', type: 'nominal' },
        x: { value: width / 2 },
        y: { value: 40 },
      },
    },
    options.title ?? title,
    options.subtitle,
  );
}
