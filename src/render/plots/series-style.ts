import type { RuleKind } from '../../core/plots/plot-data.ts';

// How the lines of a plot are told apart: a colour and a dash pattern each,
// so that neither colour vision nor a grey print is needed to follow a line.
// Series colours are drawn from the eight-colour set Okabe and Ito published
// for readers with any common colour-vision deficiency (M. Okabe, K. Ito,
// "Color Universal Design (CUD): how to make figures and presentations that
// are friendly to colorblind people", 2008); its yellow is left out, too pale
// for a thin line on white. Our own order: the darker, most distinct first.

export const SERIES_COLOURS = ['#0072B2', '#009E73', '#CC79A7', '#D55E00', '#56B4E9', '#E69F00', '#000000'];

/** Dash patterns of the series, px: solid first, then patterns that differ in rhythm, not only in length. */
export const SERIES_DASHES: number[][] = [[], [7, 3], [2, 2], [9, 3, 2, 3], [4, 2, 4, 6], [12, 2]];

/** A line drawn dashed by its data (a fitted curve over its record). */
export const DASHED = [6, 3];

/**
 * Reference lines take a colour by what they stand for, so an advisory limit
 * looks the same in every plot: darker tones of the set's orange and
 * vermillion for limits, black and greys for thresholds and positions, told apart by their dashes. The
 * second line of a kind in one plot takes the second entry.
 */
export const RULE_COLOURS: Record<RuleKind, string[]> = {
  advisory: ['#E69F00', '#9C6B00'],
  hard: ['#D55E00', '#8A3C00'],
  threshold: ['#000000', '#5A5A5A'],
  position: ['#6E6E6E', '#3D3D3D'],
};

/** Reference lines are dashed unlike any series: long dashes with short gaps, or dots with wide gaps. */
export const RULE_DASH: Record<RuleKind, number[][]> = {
  advisory: [[10, 4], [10, 4, 2, 4]],
  hard: [[14, 3], [14, 3, 3, 3]],
  threshold: [[1, 3], [1, 3, 6, 3]],
  position: [[5, 5], [2, 3]],
};

export const cycle = <T>(list: readonly T[], i: number): T => list[i % list.length];
