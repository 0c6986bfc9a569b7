/**
 * Marker layers shared by several charts: a dashed vertical rule at a chosen x with a short label at
 * the top of the plot (best round, chosen setting, chosen tree size).
 */
import { ROLE } from './theme.js';

/**
 * Two layers: a dashed rule at `x` and `label` beside it, near the top of the plot.
 *
 * @param x     Position on the x scale.
 * @param label Text next to the rule.
 * @param type  Type of the x field. __Default:__ 'quantitative'.
 * @param align Which side of the rule the text goes. __Default:__ 'left' (text to the right of the rule).
 */
export function markerLayers(
  x: number | string,
  label: string,
  type: 'quantitative' | 'nominal' | 'ordinal' = 'quantitative',
  align: 'left' | 'right' = 'left',
): Record<string, unknown>[] {
  const data = { values: [{ x, label }] };
  const encodeX = { field: 'x', type, ...(type === 'quantitative' ? {} : { bandPosition: 0.5 }) };
  return [
    { data, mark: { type: 'rule', strokeDash: [4, 3], color: ROLE.reference }, encoding: { x: encodeX } },
    {
      data,
      mark: { type: 'text', align, dx: align === 'left' ? 5 : -5, baseline: 'top', y: 2, color: ROLE.reference },
      encoding: { x: encodeX, text: { field: 'label' } },
    },
  ];
}
