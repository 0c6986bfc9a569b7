/**
 * Choose and build the loss for a boosting fit from its name and the target.
 */
import { errors } from '../../../errors.js';
import type { Target } from '../../../table/frame.js';
import type { Loss, LossName } from './loss.js';
import { squaredLoss } from './squared.js';
import { absoluteLoss } from './absolute.js';
import { huberLoss } from './huber.js';
import { quantileLoss } from './quantile.js';
import { logisticLoss } from './logistic.js';
import { multiclassLoss } from './multiclass.js';
import { poissonLoss } from './poisson.js';

export const lossNames: readonly LossName[] = ['squared', 'absolute', 'huber', 'quantile', 'logistic', 'multiclass', 'poisson'];
const forNumbers: readonly LossName[] = ['squared', 'absolute', 'huber', 'quantile', 'poisson'];

/** Loss parameters: Huber's quantile for δ and the quantile level τ. */
export interface LossParams {
  /** Quantile of |residuals| giving Huber's δ each round. __Default:__ 0.9 (Friedman 2001; from memory). */
  readonly huberQuantile?: number;
  /** Level τ of the quantile loss. __Default:__ 0.5. */
  readonly quantileLevel?: number;
}

/** The default loss for a target: squared for numbers, logistic for two classes, multiclass above. */
export function defaultLossName(target: Target): LossName {
  if (target.kind === 'number') return 'squared';
  return target.classes.length === 2 ? 'logistic' : 'multiclass';
}

/**
 * Build loss `name` for `target` (checks that the loss fits the target kind).
 * @example
 * const loss = pickLoss('huber', data.target, { huberQuantile: 0.8 });
 */
export function pickLoss(name: LossName, target: Target, params: LossParams = {}): Loss {
  if (!lossNames.includes(name)) throw errors.badOption('loss', name, `one of ${lossNames.join(', ')}`);
  if (target.kind === 'number') {
    if (!forNumbers.includes(name)) throw errors.badLoss(name, 'numeric');
  } else {
    if (name === 'logistic' && target.classes.length !== 2) throw errors.badLoss(name, `${target.classes.length}-class`);
    if (name !== 'logistic' && name !== 'multiclass') throw errors.badLoss(name, 'class');
  }
  switch (name) {
    case 'squared': return squaredLoss();
    case 'absolute': return absoluteLoss();
    case 'huber': return huberLoss(params.huberQuantile ?? 0.9);
    case 'quantile': return quantileLoss(params.quantileLevel ?? 0.5);
    case 'logistic': return logisticLoss();
    case 'multiclass': return multiclassLoss(target.kind === 'class' ? target.classes.length : 2);
    case 'poisson': return poissonLoss();
  }
}
