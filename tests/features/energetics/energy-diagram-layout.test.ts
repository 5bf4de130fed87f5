import { beforeAll, describe, expect, it } from 'vitest';
import { resetDbForTests } from '../../support/db';
import { projectsRepo } from '@/persistence/projects-repo';
import { candidatesRepo } from '@/persistence/candidates-repo';
import { DEMO_COMPOUND, DEMO_SHORTLIST } from '@/persistence/demo-project';
import { computeProjectScreening } from '@/screening-data/compute-screening';
import { energyCycleOf } from '@/screening-data/energy-cycle';
import { inSentence } from '@/screening-data/candidate-screening';
import {
  arrowBox,
  boxesOverlap,
  drawingSize,
  energyDiagramLayout,
  labelBox,
  type EnergyCycle,
} from '@/components/charts/energy-diagram-layout';

/*
 * Issue 19: a label lay over an arrow in the cycle diagram. The layout is computed for every salt of
 * the fictional demo (the demo compound with its six shortlisted counter-ions, as the app computes
 * them) and for sodium chloride; each label's box (text width estimated generously per character)
 * must clear every arrow (shaft and head), every other label, and the drawing's edges.
 */
let demoCycles: EnergyCycle[] = [];

beforeAll(async () => {
  await resetDbForTests();
  // Formula only (no SMILES), so the structure parser is not loaded in jsdom.
  const project = await projectsRepo.create('Diagram layout', { ...DEMO_COMPOUND, smiles: '' });
  for (const ionId of DEMO_SHORTLIST) await candidatesRepo.add(project.id, ionId);
  const data = await computeProjectScreening({
    project,
    candidates: await candidatesRepo.listForProject(project.id),
    measurements: [],
    customIons: [],
  });
  demoCycles = Object.values(data.energetics).flatMap((e) =>
    e.thermo ? [energyCycleOf({ ...e, thermo: e.thermo }, e.candidateId)] : [],
  );
}, 60000);

/*
 * NaCl: ΔH_L = 787 kJ/mol (CRC Handbook, "Lattice Energies", from memory), ΔH_hyd(Na⁺) = −406 and
 * ΔH_hyd(Cl⁻) = −378 kJ/mol (Smith 1977, J. Chem. Educ. 54, 540, from memory) — a net ΔH_sol near 0,
 * the case where the net arrow is shortest.
 */
const nacl: EnergyCycle = {
  saltLabel: 'NaCl (1:1)',
  cationLabel: 'Na⁺',
  anionLabel: 'Cl⁻',
  cationsPerFormula: 1,
  anionsPerFormula: 1,
  lattice: { value: 787, uncertainty: 20 },
  cationHydration: { value: -406, uncertainty: 10 },
  anionHydration: { value: -378, uncertainty: 10 },
  solution: { value: 3, uncertainty: 25 },
};

/** What overlaps in the drawing of a figure of the given size (the component draws it this way). */
function overlapsOf(cycle: EnergyCycle, figureWidth: number, figureHeight: number): string[] {
  const { width, height } = drawingSize(figureWidth, figureHeight);
  const layout = energyDiagramLayout(cycle, width, height);
  const found: string[] = [];
  const boxes = layout.labels.map((l) => ({ text: l.text, box: labelBox(l) }));
  for (const { text, box } of boxes) {
    layout.arrows.forEach((a, i) => {
      if (boxesOverlap(box, arrowBox(a))) found.push(`"${text}" over arrow ${i}`);
    });
    if (box.left < layout.axisX || box.right > width || box.top < 0 || box.bottom > height)
      found.push(`"${text}" outside the drawing`);
  }
  boxes.forEach((a, i) =>
    boxes.slice(i + 1).forEach((b) => {
      if (boxesOverlap(a.box, b.box)) found.push(`"${a.text}" over "${b.text}"`);
    }),
  );
  return found;
}

describe('energy-level diagram layout (issue 19: no label over an arrow)', () => {
  it('computes a cycle for each of the demo salts', () => {
    expect(demoCycles.length).toBe(DEMO_SHORTLIST.length);
  });

  // The sizes the app asks for: the Energetics area (the default 560 × 360) and the sheet (350 × 250).
  const SIZES = [
    [560, 360],
    [350, 250],
  ] as const;

  it('keeps every label clear of every arrow and of every other label, for each demo salt', () => {
    for (const [w, h] of SIZES)
      for (const cycle of demoCycles)
        expect({
          size: `${w}×${h}`,
          salt: cycle.saltLabel,
          overlaps: overlapsOf(cycle, w, h),
        }).toEqual({
          size: `${w}×${h}`,
          salt: cycle.saltLabel,
          overlaps: [],
        });
  });

  it('keeps labels clear for sodium chloride, whose net arrow is a few kJ/mol long', () => {
    for (const [w, h] of SIZES) expect(overlapsOf(nacl, w, h)).toEqual([]);
  });

  it('draws a figure narrower than the labels need wider, in the same shape, and scales it down', () => {
    expect(drawingSize(560, 360)).toEqual({ width: 560, height: 360 });
    // 350 × 250 drawn at 480 wide: 250 × 480 / 350 = 342.9 → 343 units high.
    expect(drawingSize(350, 250)).toEqual({ width: 480, height: 343 });
  });

  it('finds an overlap when one is there (the check can fail)', () => {
    const layout = energyDiagramLayout(nacl, 560, 360);
    const arrow = layout.arrows[1]!;
    const onArrow = { ...layout.labels[0]!, x: arrow.x - 4, y: (arrow.y1 + arrow.y2) / 2 };
    expect(boxesOverlap(labelBox(onArrow), arrowBox(arrow))).toBe(true);
  });
});

// Issue 19 (screenshots): the middle level read "drug ion (aq) + Chloride (g)" — a capital inside a
// sentence — and a 2:1 salt's level left out its two drug ions.
describe('the middle level names each ion as a sentence would, with its count per formula unit', () => {
  it('reads "drug ion (aq) + chloride (g)" for the demo hydrochloride', () => {
    const labels = demoCycles.map((c) =>
      energyDiagramLayout(c, 560, 360).labels.map((l) => l.text),
    );
    expect(labels.flat()).toContain('drug ion (aq) + chloride (g)');
  });

  it('counts two drug ions in the hemisulfate (2:1)', () => {
    const hemi = demoCycles.find((c) => c.cationsPerFormula === 2);
    expect(hemi).toBeDefined();
    const texts = energyDiagramLayout(hemi!, 560, 360).labels.map((l) => l.text);
    expect(texts).toContain('2 × drug ion (aq) + sulfate (g)');
  });

  it('keeps a name whose capital belongs to it (L-Arginine)', () => {
    expect(inSentence('L-Arginine')).toBe('L-Arginine');
    expect(inSentence('Hydrogen maleate')).toBe('hydrogen maleate');
  });
});
