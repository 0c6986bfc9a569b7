/**
 * Text widths for rendering in Node, where vega has no canvas to measure text and otherwise guesses
 * 0.8 × font size per character (far too wide, which pushes axis titles away from their labels).
 *
 * Widths are the advance widths of Helvetica in thousandths of an em (Adobe Core 14 font metrics,
 * Helvetica.afm; from memory), which Arial and Liberation Sans — the house font — share.
 */
const ASCII_WIDTHS =
  // space ! " # $ % & ' ( ) * + , - . / 0-9 : ; < = > ? @
  '278 278 355 556 556 889 667 191 333 333 389 584 278 333 278 278 556 556 556 556 556 556 556 556 556 556 278 278 584 584 584 556 1015 ' +
  // A-Z
  '667 667 722 722 667 611 778 722 278 500 667 556 833 722 778 667 778 722 667 611 722 667 944 667 667 611 ' +
  // [ \ ] ^ _ `
  '278 278 278 469 556 333 ' +
  // a-z
  '556 556 500 556 556 278 556 556 222 222 500 222 833 556 556 556 556 333 500 278 556 500 722 500 500 500 ' +
  // { | } ~
  '334 260 334 584';
const widths = ASCII_WIDTHS.split(' ').map(Number);

/** Widths of a few non-ASCII characters charts use (thousandths of an em). */
const EXTRA: Readonly<Record<string, number>> = {
  '−': 584, '≤': 584, '≥': 584, '×': 584, '²': 333, '…': 1000, '·': 278, '→': 1000, '±': 584, '–': 556, '—': 1000,
};

/** Width in pixels of `text` at `fontSize` (bold text about 7% wider). */
export function textWidth(text: string, fontSize: number, bold = false): number {
  let total = 0;
  for (const ch of text) {
    const code = ch.codePointAt(0) ?? 32;
    total += code >= 32 && code <= 126 ? widths[code - 32] : (EXTRA[ch] ?? 600);
  }
  return (total / 1000) * fontSize * (bold ? 1.07 : 1);
}

interface TextItem {
  fontSize?: number | string;
  fontWeight?: number | string;
  limit?: number;
}

/** A replacement for vega's `textMetrics.width(item, text)`. */
export function measureItemText(item: TextItem, text: unknown): number {
  const size = item.fontSize != null ? Number(item.fontSize) || 0 : 11;
  const line = text == null ? '' : String(text).trim();
  const weight = item.fontWeight;
  const bold = weight === 'bold' || (typeof weight === 'number' && weight >= 600) || weight === '600' || weight === '700';
  const w = textWidth(line, size, bold);
  return item.limit !== undefined && item.limit > 0 ? Math.min(w, item.limit) : w;
}
