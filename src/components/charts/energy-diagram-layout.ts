import { niceTicks } from './WhiskerBars';

export interface EnergyValue {
  value: number;
  uncertainty: number;
}

export interface EnergyCycle {
  /** Salt as named on screen, e.g. "Demorazine mesylate (1:1)". */
  saltLabel: string;
  cationLabel: string;
  anionLabel: string;
  cationsPerFormula: number;
  anionsPerFormula: number;
  /** Lattice dissociation enthalpy ΔH_L (> 0), kJ/mol. */
  lattice: EnergyValue;
  /** Hydration enthalpy of ALL cations of one formula unit (ν₊·ΔH_hyd,+ < 0), kJ/mol. */
  cationHydration: EnergyValue;
  /** Hydration enthalpy of ALL anions of one formula unit (ν₋·ΔH_hyd,− < 0), kJ/mol. */
  anionHydration: EnergyValue;
  /** ΔH_sol = ΔH_L + ν₊ΔH_hyd,+ + ν₋ΔH_hyd,−, kJ/mol, with its uncertainty carried through. */
  solution: EnergyValue;
}

/** A rectangle in SVG user units (y grows downward). */
export interface Box {
  left: number;
  top: number;
  right: number;
  bottom: number;
}

export interface DiagramLabel {
  text: string;
  x: number;
  /** Baseline. */
  y: number;
  anchor: 'start' | 'middle' | 'end';
  fill: string;
}

export interface DiagramArrow {
  x: number;
  y1: number;
  y2: number;
  colour: string;
  /** Length of the arrow head, px. */
  head: number;
}

export interface DiagramLevel {
  x1: number;
  x2: number;
  y: number;
  /** ±1σ band (top, bottom), when the level carries an estimate's uncertainty. */
  band: { top: number; bottom: number } | null;
}

export interface EnergyDiagramLayout {
  y: (kJ: number) => number;
  ticks: number[];
  axisX: number;
  top: number;
  bottom: number;
  levels: DiagramLevel[];
  arrows: DiagramArrow[];
  labels: DiagramLabel[];
}

/** Label font size, px. */
export const LABEL_FONT_PX = 11;
/**
 * Width of one character as a fraction of the font size, taken generously (common practice for
 * sans-serif text: the average glyph is about half an em; Δ, ± and digits are wider): labels are
 * placed with this estimate so that they clear the arrows without measuring text in the browser.
 */
const CHAR_EM = 0.62;
const HEAD_HALF_WIDTH = 5;
const COLOURS = { level: '#1d3a4a', lattice: '#b4621b', hydration: '#1f6f6b', net: '#5b4a9e' };

const minus = (s: string) => s.replace('-', '−');

/**
 * The narrowest drawing, in SVG units, whose labels clear the arrows for the demo salts and sodium
 * chloride (energy-diagram-layout.test.ts); a smaller figure is drawn at this width and scaled down.
 */
export const MIN_DRAWING_WIDTH = 480;

/** The drawing's size for a figure of the given size: at least MIN_DRAWING_WIDTH wide, same shape. */
export function drawingSize(width: number, height: number): { width: number; height: number } {
  if (width >= MIN_DRAWING_WIDTH) return { width, height };
  return { width: MIN_DRAWING_WIDTH, height: Math.round((height * MIN_DRAWING_WIDTH) / width) };
}

/** The box a label's text occupies (estimated glyph widths; ascent 0.8 em, descent 0.25 em). */
export function labelBox(label: DiagramLabel): Box {
  const w = label.text.length * CHAR_EM * LABEL_FONT_PX;
  const left =
    label.anchor === 'start' ? label.x : label.anchor === 'end' ? label.x - w : label.x - w / 2;
  return {
    left,
    right: left + w,
    top: label.y - 0.8 * LABEL_FONT_PX,
    bottom: label.y + 0.25 * LABEL_FONT_PX,
  };
}

/** The box an arrow occupies: its shaft and its head. */
export function arrowBox(arrow: DiagramArrow): Box {
  return {
    left: arrow.x - HEAD_HALF_WIDTH,
    right: arrow.x + HEAD_HALF_WIDTH,
    top: Math.min(arrow.y1, arrow.y2),
    bottom: Math.max(arrow.y1, arrow.y2),
  };
}

export function boxesOverlap(a: Box, b: Box): boolean {
  return a.left < b.right && b.left < a.right && a.top < b.bottom && b.top < a.bottom;
}

/** The four levels' enthalpies relative to the solid salt, kJ/mol. */
function levelEnthalpies(cycle: EnergyCycle) {
  const { lattice, cationHydration, anionHydration } = cycle;
  const gas = lattice.value;
  const half = gas + cationHydration.value;
  return { solid: 0, gas, half, solution: half + anionHydration.value };
}

/** The vertical scale: every level and its ±1σ band inside, with 8 % room above and below. */
function verticalScale(cycle: EnergyCycle, top: number, bottom: number) {
  const kJ = levelEnthalpies(cycle);
  const { lattice, solution } = cycle;
  const values = [
    0,
    kJ.gas + lattice.uncertainty,
    kJ.half,
    kJ.solution - solution.uncertainty,
    kJ.solution + solution.uncertainty,
  ];
  const lo = Math.min(...values);
  const hi = Math.max(...values);
  const pad = (hi - lo) * 0.08 || 10;
  const y = (v: number) => bottom - ((v - (lo - pad)) / (hi - lo + 2 * pad)) * (bottom - top);
  return { y, ticks: niceTicks(lo - pad, hi + pad, 6) };
}

/**
 * Where everything of the energy-level diagram goes, in SVG units: four levels in four columns, an
 * arrow into each level from the one before (its label to its right, half-way up), and the net arrow
 * solid → solution to the right of the last level with its label beside it. Room on the right is
 * kept for that label, and a level label wider than its level starts at the level's left end, so
 * that no label lies over an arrow.
 */
export function energyDiagramLayout(
  cycle: EnergyCycle,
  width: number,
  height: number,
): EnergyDiagramLayout {
  const top = 16;
  const bottom = height - 20;
  const axisX = 64;
  const { y, ticks } = verticalScale(cycle, top, bottom);
  const kJ = levelEnthalpies(cycle);
  const { lattice, cationHydration, anionHydration, solution } = cycle;
  const netText = `ΔH_sol ${minus(solution.value.toFixed(0))} ± ${solution.uncertainty.toFixed(0)}`;
  const rightRoom = netText.length * CHAR_EM * LABEL_FONT_PX + 24;
  const colW = (width - axisX - 30 - rightRoom) / 4;
  const levelW = colW - 14;
  const col = (i: number) => axisX + 30 + i * colW;

  // A level's label goes on the side no arrow leaves from: below the solid (the lattice arrow rises
  // from it), below the solution when the net arrow comes down onto it, above otherwise.
  const steps = [
    { v: kJ.solid, label: 'salt (s)', band: 0, below: true },
    { v: kJ.gas, label: 'ions (g)', band: lattice.uncertainty, below: false },
    {
      v: kJ.half,
      label: `${perFormula(cycle.cationsPerFormula, cycle.cationLabel)} (aq) + ${perFormula(cycle.anionsPerFormula, cycle.anionLabel)} (g)`,
      band: 0,
      below: false,
    },
    { v: kJ.solution, label: 'ions (aq)', band: solution.uncertainty, below: kJ.solution < 0 },
  ];
  const levels: DiagramLevel[] = steps.map((s, i) => ({
    x1: col(i),
    x2: col(i) + levelW,
    y: y(s.v),
    band: s.band ? { top: y(s.v + s.band), bottom: y(s.v - s.band) } : null,
  }));
  const labels: DiagramLabel[] = steps.map((s, i) =>
    levelLabel(s.label, col(i), levelW, y(s.v), s.below),
  );

  const arrow = (x: number, from: number, to: number, colour: string): DiagramArrow => ({
    x,
    y1: y(from),
    y2: y(to),
    colour,
    head: Math.min(8, Math.abs(y(to) - y(from)) / 2),
  });
  const arrows = [
    arrow(col(1) - 8, kJ.solid, kJ.gas, COLOURS.lattice),
    arrow(col(2) - 8, kJ.gas, kJ.half, COLOURS.hydration),
    arrow(col(3) - 8, kJ.half, kJ.solution, COLOURS.hydration),
    arrow(col(3) + levelW + 8, kJ.solid, kJ.solution, COLOURS.net),
  ];
  const arrowTexts = [
    `ΔH_L ${lattice.value.toFixed(0)}`,
    `ΔH_hyd,+ ${minus(cationHydration.value.toFixed(0))}`,
    `ΔH_hyd,− ${minus(anionHydration.value.toFixed(0))}`,
    netText,
  ];
  arrows.forEach((a, i) => labels.push(arrowLabel(arrowTexts[i]!, a)));
  return { y, ticks, axisX, top, bottom, levels, arrows, labels };
}

/** A level's name just above or below its line: centred when it fits the level, else from its left end. */
function levelLabel(
  text: string,
  x1: number,
  levelW: number,
  y: number,
  below: boolean,
): DiagramLabel {
  const fits = text.length * CHAR_EM * LABEL_FONT_PX <= levelW;
  return {
    text,
    x: fits ? x1 + levelW / 2 : x1,
    y: below ? y + 5 + 0.8 * LABEL_FONT_PX : y - 5,
    anchor: fits ? 'middle' : 'start',
    fill: COLOURS.level,
  };
}

/** An arrow's label: to its right, half-way along it. */
function arrowLabel(text: string, a: DiagramArrow): DiagramLabel {
  return {
    text,
    x: a.x + HEAD_HALF_WIDTH + 3,
    y: (a.y1 + a.y2) / 2 + 0.3 * LABEL_FONT_PX,
    anchor: 'start',
    fill: a.colour,
  };
}

/** "2 × chloride" for two ions per formula unit, the bare name for one. */
const perFormula = (n: number, label: string) => (n === 1 ? label : `${n} × ${label}`);
