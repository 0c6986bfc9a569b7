/**
 * Sizing the node boxes of a drawn tree: a slot wide enough for the longest caption (within a cap), and
 * captions still too long for the widest box broken onto two lines, with taller boxes to hold them.
 */
import { textWidth } from './text-width.js';
import { wrapCaption } from './wrap-caption.js';

/** Box half-width in slots (a box is 88% of its slot). */
export const BOX_HALF_W = 0.44;
/** Default slot width and the widest the chart widens it to, in pixels. */
export const SLOT_DEFAULT = 128;
export const SLOT_CAP = 220;
export const TITLE_FONT = 11.5;
export const LINE_FONT = 10.5;

/** Box sizes for a set of node captions. */
export interface BoxSizes {
  /** Pixels per slot across. */
  readonly slot: number;
  /** Each node's title as one or two lines. */
  readonly titles: readonly (string | string[])[];
  /** Whether any title takes two lines (the boxes are then taller). */
  readonly wrapped: boolean;
}

/** Text room in a box of a slot `slot` pixels wide (the text mark's limit). */
export function textRoom(slot: number): number {
  return slot * 2 * BOX_HALF_W - 8;
}

/**
 * Slot width and title lines for node captions. With `fixedSlot` the slot is as given; otherwise it is the
 * narrowest at least `SLOT_DEFAULT` that fits every line (4 px to spare), at most `SLOT_CAP`. Titles wider
 * than the room at that width are wrapped.
 *
 * @example
 * sizeBoxes([{ title: 'bruise_score', rows: '1,200 rows', third: '' }]).slot; // 128
 */
export function sizeBoxes(nodes: readonly { title: string; rows: string; third: string }[], fixedSlot?: number): BoxSizes {
  let other = 0, widestTitle = 0;
  for (const n of nodes) {
    other = Math.max(other, textWidth(n.rows, LINE_FONT), textWidth(n.third, LINE_FONT));
    widestTitle = Math.max(widestTitle, textWidth(n.title, TITLE_FONT, true));
  }
  const fit = (w: number) => Math.min(SLOT_CAP, Math.max(SLOT_DEFAULT, Math.ceil((w + 12) / (2 * BOX_HALF_W))));
  const room = textRoom(fixedSlot ?? fit(Math.max(other, widestTitle)));
  const titles = nodes.map((n) => {
    const lines = wrapCaption(n.title, room - 4, TITLE_FONT, true);
    return lines.length === 1 ? lines[0] : lines;
  });
  const wrapped = titles.some((t) => Array.isArray(t));
  let widest = other;
  for (const t of titles) for (const line of Array.isArray(t) ? t : [t]) widest = Math.max(widest, textWidth(line, TITLE_FONT, true));
  return { slot: fixedSlot ?? fit(widest), titles, wrapped };
}
