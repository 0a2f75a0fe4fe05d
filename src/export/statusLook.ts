/**
 * How a status looks, everywhere in the editor (canvas, panels, schedules) and the exports: a plain word, a
 * glyph, a colour and a line style, so status never rests on colour alone. The three colours
 * differ in lightness as well as hue (teal / ochre / plum), which keeps them apart for the common
 * forms of colour blindness and in greyscale print.
 */
import { STATUS_SHOWN, type Status } from '../solver/results.ts';

export interface StatusLook {
  /** Our word for it, shown to the user. */
  word: string;
  /** A sentence for tooltips and screen readers. */
  meaning: string;
  glyph: string;
  colour: string;
  /** Light background for badges and rows. */
  tint: string;
  /** SVG stroke-dasharray for cables ('' = solid). */
  dash: string;
  strokeWidth: number;
}

export const STATUS_LOOK: Record<Status | 'none', StatusLook> = {
  within: {
    word: STATUS_SHOWN.within,
    meaning: 'within its limit',
    glyph: '✓',
    colour: '#17707d',
    tint: '#e3f2f3',
    dash: '',
    strokeWidth: 2,
  },
  close: {
    word: STATUS_SHOWN.close,
    meaning: 'close to its limit (above the close-to-limit share of its budget)',
    glyph: '▲',
    colour: '#b06f00',
    tint: '#fbf0dc',
    dash: '9 5',
    strokeWidth: 2.5,
  },
  over: {
    word: STATUS_SHOWN.over,
    meaning: 'over its limit',
    glyph: '✕',
    colour: '#8e1f5c',
    tint: '#f6e3ee',
    dash: '14 4 3 4',
    strokeWidth: 4,
  },
  none: {
    word: 'no result',
    meaning: 'not computed (not fed from a supply, or data missing)',
    glyph: '–',
    colour: '#7b8490',
    tint: '#eef0f2',
    dash: '2 4',
    strokeWidth: 1.5,
  },
};

export function statusLook(status: Status | null | undefined): StatusLook {
  return STATUS_LOOK[status ?? 'none'];
}
