/**
 * Areas under curves drawn by the ROC and precision–recall charts, for the legend when the caller
 * did not pass one.
 */

/**
 * Area under a ROC curve by the trapezoid rule over points sorted by false positive rate (then true
 * positive rate) — Fawcett 2006, "An introduction to ROC analysis", Pattern Recognition Letters 27:861–874,
 * section 7 (the trapezoid area). The curve is closed with (0,0) and (1,1) when they are missing.
 *
 * @example
 * areaUnderRoc([{ fpr: 0, tpr: 0 }, { fpr: 1, tpr: 1 }]); // 0.5
 */
export function areaUnderRoc(points: readonly { fpr: number; tpr: number }[]): number {
  const pts = [{ fpr: 0, tpr: 0 }, ...points, { fpr: 1, tpr: 1 }].sort((a, b) => a.fpr - b.fpr || a.tpr - b.tpr);
  let area = 0;
  for (let i = 1; i < pts.length; i++) area += (pts[i].fpr - pts[i - 1].fpr) * (pts[i].tpr + pts[i - 1].tpr) / 2;
  return area;
}

/**
 * Average precision: Σ (R_i − R_{i−1}) · P_i over points sorted by recall — the step-wise area the
 * precision–recall chart draws (no linear interpolation between points, which overstates the area:
 * Davis & Goadrich 2006, "The relationship between precision-recall and ROC curves", ICML).
 *
 * @example
 * averagePrecision([{ recall: 0.5, precision: 1 }, { recall: 1, precision: 0.5 }]); // 0.75
 */
export function averagePrecision(points: readonly { recall: number; precision: number }[]): number {
  const pts = [...points].sort((a, b) => a.recall - b.recall || b.precision - a.precision);
  let area = 0, prev = 0;
  for (const p of pts) { area += (p.recall - prev) * p.precision; prev = p.recall; }
  return area;
}
