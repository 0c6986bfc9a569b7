/**
 * Breaking a caption that is too wide for its box onto two lines, at the break (a space, or after `_`, `-`
 * or `/`) that makes the wider line narrowest. Widths come from `text-width.ts`.
 */
import { textWidth } from './text-width.js';

/**
 * `text` as one line when it fits `maxWidth` pixels, else as two lines split at the best break; a caption
 * with no break stays on one line (the renderer then ends it with "…").
 *
 * @param text     The caption.
 * @param maxWidth Widest line in pixels.
 * @param fontSize Font size in pixels.
 * @param bold     Bold text. __Default:__ false.
 * @example
 * wrapCaption('Storage Duration Before Grading (h)', 150, 11.5, true); // ['Storage Duration', 'Before Grading (h)']
 */
export function wrapCaption(text: string, maxWidth: number, fontSize: number, bold = false): string[] {
  if (textWidth(text, fontSize, bold) <= maxWidth) return [text];
  let best: string[] | undefined;
  let bestWidth = Infinity;
  for (let i = 1; i < text.length; i++) {
    const ch = text[i - 1];
    let first: string, second: string;
    if (text[i] === ' ') { first = text.slice(0, i); second = text.slice(i + 1); }
    else if (ch === '_' || ch === '-' || ch === '/') { first = text.slice(0, i); second = text.slice(i); }
    else continue;
    first = first.trimEnd(); second = second.trimStart();
    if (first.length === 0 || second.length === 0) continue;
    const wider = Math.max(textWidth(first, fontSize, bold), textWidth(second, fontSize, bold));
    if (wider < bestWidth) { bestWidth = wider; best = [first, second]; }
  }
  return best ?? [text];
}
