import { describe, expect, it } from 'vitest';
import { textWidth } from '../../src/charts/text-width.js';
import { wrapCaption } from '../../src/charts/wrap-caption.js';

describe('wrapCaption(text, maxWidth, fontSize, bold)', () => {
  it('keeps a caption that fits on one line', () => {
    expect(wrapCaption('bruise_score', 200, 11.5, true)).toEqual(['bruise_score']);
  });
  it('splits at the space that makes the wider line narrowest', () => {
    const lines = wrapCaption('Storage Duration Before Grading (h)', 150, 11.5, true);
    expect(lines).toEqual(['Storage Duration', 'Before Grading (h)']);
    const alt = ['Storage Duration Before', 'Grading (h)'];
    const wider = (ls: string[]) => Math.max(...ls.map((l) => textWidth(l, 11.5, true)));
    expect(wider(lines)).toBeLessThan(wider(alt));
  });
  it('breaks after an underscore and keeps it; a caption with no break stays whole', () => {
    expect(wrapCaption('storage_hours_before_grading', 60, 11.5)).toEqual(['storage_hours_', 'before_grading']);
    expect(wrapCaption('Lagerungsdauervorsortierung', 40, 11.5)).toEqual(['Lagerungsdauervorsortierung']);
  });
});
