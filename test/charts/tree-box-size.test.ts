import { describe, expect, it } from 'vitest';
import { SLOT_CAP, SLOT_DEFAULT, sizeBoxes, textRoom, TITLE_FONT } from '../../src/charts/tree-box-size.js';
import { textWidth } from '../../src/charts/text-width.js';

const node = (title: string) => ({ title, rows: '1,200 rows', third: '' });

describe('sizeBoxes(nodes, fixedSlot)', () => {
  it('short captions keep the default slot', () => {
    expect(sizeBoxes([node('bruise_score')])).toEqual({ slot: SLOT_DEFAULT, titles: ['bruise_score'], wrapped: false });
  });
  it('widens the slot until the longest title fits its box', () => {
    const title = 'Flipper-like Length (mm)';
    const { slot, wrapped } = sizeBoxes([node('a'), node(title)]);
    expect(wrapped).toBe(false);
    expect(slot).toBeGreaterThan(SLOT_DEFAULT);
    expect(slot).toBeLessThanOrEqual(SLOT_CAP);
    expect(textRoom(slot)).toBeGreaterThanOrEqual(textWidth(title, TITLE_FONT, true));
  });
  it('past the cap, wraps the title onto two lines that each fit', () => {
    const { slot, titles, wrapped } = sizeBoxes([node('Storage Duration Before Grading, Cold Room (hours)')]);
    expect(wrapped).toBe(true);
    expect(Array.isArray(titles[0])).toBe(true);
    for (const line of titles[0] as string[]) expect(textWidth(line, TITLE_FONT, true)).toBeLessThanOrEqual(textRoom(slot));
  });
  it('a slot given by the caller is kept; titles are wrapped to it', () => {
    const { slot, wrapped } = sizeBoxes([node('Storage Duration Before Grading')], 100);
    expect(slot).toBe(100);
    expect(wrapped).toBe(true);
  });
});
