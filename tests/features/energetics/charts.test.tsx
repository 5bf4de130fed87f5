import { describe, expect, it } from 'vitest';
import { act, render, screen } from '@testing-library/react';
import { EnergyLevelDiagram } from '@/components/charts/EnergyLevelDiagram';
import { WhiskerBars, niceTicks } from '@/components/charts/WhiskerBars';
import { PhSolubilityChart } from '@/components/charts/PhSolubilityChart';

/*
 * Sodium chloride's cycle as the drawing input: ΔH_L = 787 kJ/mol (CRC Handbook, "Lattice Energies"
 * table, from memory), ΔH_hyd(Na⁺) = −406 and ΔH_hyd(Cl⁻) = −378 kJ/mol (conventional absolute scale,
 * Smith 1977, J. Chem. Educ. 54, 540, from memory). These test the picture, not the models.
 */
const nacl = {
  saltLabel: 'NaCl (1:1)',
  cationLabel: 'Na⁺',
  anionLabel: 'Cl⁻',
  cationsPerFormula: 1,
  anionsPerFormula: 1,
  lattice: { value: 787, uncertainty: 20 },
  cationHydration: { value: -406, uncertainty: 10 },
  anionHydration: { value: -378, uncertainty: 10 },
  solution: { value: 787 - 406 - 378, uncertainty: 25 },
};

describe('energy-level diagram', () => {
  it('draws levels to scale: equal kJ/mol give equal heights', () => {
    const { container } = render(<EnergyLevelDiagram cycle={nacl} />);
    const levels = [...container.querySelectorAll('line[stroke-width="2.5"]')].map((l) =>
      Number(l.getAttribute('y1')),
    );
    expect(levels).toHaveLength(4);
    const [solid, gas, half, aq] = levels as [number, number, number, number];
    // SVG y grows downward: the lattice step goes up (smaller y), hydration steps go down.
    expect(gas).toBeLessThan(solid);
    expect(half).toBeGreaterThan(gas);
    const perKJ = (solid - gas) / 787;
    expect((half - gas) / perKJ).toBeCloseTo(406, 6);
    expect((aq - half) / perKJ).toBeCloseTo(378, 6);
    expect((solid - aq) / perKJ).toBeCloseTo(787 - 406 - 378, 6);
  });

  it('draws a small figure (the sheet’s 350 × 250) at the width its labels need and scales it down', () => {
    const { container } = render(<EnergyLevelDiagram cycle={nacl} width={350} height={250} />);
    const svg = container.querySelector('svg')!;
    expect(svg.getAttribute('viewBox')).toBe('0 0 480 343');
    expect(svg.style.maxWidth).toBe('350px');
  });

  it('states every step with its uncertainty in the text alternative', () => {
    render(<EnergyLevelDiagram cycle={nacl} />);
    const caption = screen.getByText(/net ΔH_sol/);
    expect(caption.textContent).toContain('ΔH_L = 787 ± 20 kJ/mol');
    expect(caption.textContent).toContain('−406 ± 10 kJ/mol');
    expect(caption.textContent).toContain('net ΔH_sol = 3 ± 25 kJ/mol');
  });
});

describe('whisker bars', () => {
  it('draws a whisker of ±u around each value and a caption', () => {
    const { container } = render(
      <WhiskerBars
        title="t"
        caption="Estimated ΔH_sol per candidate"
        unit="kJ/mol"
        domain={[-100, 100]}
        rows={[{ id: 'a', label: 'A', value: 10, uncertainty: 20 }]}
        width={500}
      />,
    );
    expect(screen.getByText('Estimated ΔH_sol per candidate')).toBeInTheDocument();
    const whisker = container.querySelector('g[stroke-width="1.4"] line')!;
    const x1 = Number(whisker.getAttribute('x1'));
    const x2 = Number(whisker.getAttribute('x2'));
    const zero = container.querySelector('line[stroke-width="1.5"]')!;
    const x0 = Number(zero.getAttribute('x1'));
    // −10 and +30 around 0: the whisker's left end sits 10/30 as far from zero as its right end.
    expect((x0 - x1) / (x2 - x0)).toBeCloseTo(10 / 30, 6);
  });

  it('picks round ticks', () => {
    expect(niceTicks(0, 1, 5)).toEqual([0, 0.2, 0.4, 0.6, 0.8, 1]);
    expect(niceTicks(-37, 112, 5)).toEqual([0, 50, 100]);
  });
});

describe('pH–solubility chart', () => {
  it('summarises each curve in words: pH_max and the lowest solubility in pH 1.2–6.8', () => {
    render(
      <PhSolubilityChart
        doseLineMgPerMl={0.8}
        series={[
          {
            id: 'free',
            label: 'free base',
            kind: 'free-form',
            points: [1, 2, 7, 8].map((pH) => ({ pH, solubilityMgPerMl: 10 ** (7 - pH) * 0.01 })),
          },
          {
            id: 's',
            label: 'salt',
            kind: 'salt',
            estimated: true,
            phMax: 5.5,
            points: [1, 2, 7].map((pH) => ({ pH, solubilityMgPerMl: 3 })),
          },
        ]}
      />,
    );
    expect(screen.getByText(/free base: lowest in pH 1.2–6.8 .* at pH 2.0/)).toBeInTheDocument();
    expect(screen.getByText(/salt \(estimated\): pH_max 5.50/)).toBeInTheDocument();
  });
});

describe('pH chart axis sized to its data (issue 19)', () => {
  it('spans the data: from the 1–2–5 step below the lowest value to the one above the salts and the dose line', async () => {
    const { solubilityAxis } = await import('@/components/charts/PhSolubilityChart');
    // Hand-made curves (inputs, not results): a free form climbing to 500 mg/mL at pH 1, a salt
    // plateau at 0.6 mg/mL, and the dose line 100 mg / 250 mL = 0.4 mg/mL (ICH M9 2019 volume).
    const axis = solubilityAxis(
      [
        {
          id: 'free',
          label: 'free form',
          kind: 'free-form',
          points: [
            { pH: 1, solubilityMgPerMl: 500 },
            { pH: 8, solubilityMgPerMl: 0.02 },
          ],
        },
        {
          id: 'salt',
          label: 'salt',
          kind: 'salt',
          points: [
            { pH: 1, solubilityMgPerMl: 0.6 },
            { pH: 8, solubilityMgPerMl: 0.02 },
          ],
        },
      ],
      0.4,
    );
    // Lowest value 0.02 is itself a 1–2–5 step; the highest salt value 0.6 rounds up to 1.
    expect(axis.lo).toBeCloseTo(0.02, 12);
    expect(axis.hi).toBeCloseTo(1, 12);
    expect(axis.ticks).toEqual([0.02, 0.1, 1]);
  });

  it('ends at 2 mg/mL, not 10, when the highest salt plateau is 1.08 mg/mL', async () => {
    const { solubilityAxis, logTick } = await import('@/components/charts/PhSolubilityChart');
    // Hand-made curves shaped like the demo's (a salt plateau just above 1 mg/mL, the lowest value
    // 0.0245 mg/mL, dose line 100 mg / 250 mL = 0.4 mg/mL): 0.0245 → 0.02 below, 1.08 → 2 above.
    const axis = solubilityAxis(
      [
        {
          id: 'free',
          label: 'free form',
          kind: 'free-form',
          points: [
            { pH: 1, solubilityMgPerMl: 9.46e4 },
            { pH: 8, solubilityMgPerMl: 0.0245 },
          ],
        },
        {
          id: 'salt',
          label: 'salt',
          kind: 'salt',
          points: [
            { pH: 1, solubilityMgPerMl: 1.08 },
            { pH: 8, solubilityMgPerMl: 0.0245 },
          ],
        },
      ],
      0.4,
    );
    expect([axis.lo, axis.hi]).toEqual([0.02, 2]);
    expect(axis.ticks).toEqual([0.02, 0.1, 1, 2]);
    // Tick labels: plain numbers from 0.001 to 1000, powers of ten beyond with their mantissa.
    expect([logTick(0.02), logTick(2), logTick(1e4), logTick(2e4), logTick(5e-5)]).toEqual([
      '0.02',
      '2',
      '10⁴',
      '2×10⁴',
      '5×10⁻⁵',
    ]);
  });
});

describe('pH chart width (issue 19: it used half the panel)', () => {
  const series = [
    {
      id: 'salt',
      label: 'salt',
      kind: 'salt' as const,
      points: [1, 8].map((pH) => ({ pH, solubilityMgPerMl: 1 })),
    },
  ];
  const chartWidth = (container: HTMLElement) =>
    Number(container.querySelector('.recharts-wrapper > svg')?.getAttribute('width'));

  it('falls back to 680 px where nothing can be measured (jsdom has no layout)', () => {
    const { container } = render(<PhSolubilityChart doseLineMgPerMl={null} series={series} />);
    expect(chartWidth(container)).toBe(680);
  });

  it('takes its container’s width as the container reports it', () => {
    const original = globalThis.ResizeObserver;
    // A stand-in observer: the test reports a width for the element the chart observes.
    const watched: { target: Element; cb: ResizeObserverCallback }[] = [];
    globalThis.ResizeObserver = class {
      constructor(private readonly cb: ResizeObserverCallback) {}
      observe(target: Element) {
        watched.push({ target, cb: this.cb });
      }
      unobserve() {}
      disconnect() {}
    } as unknown as typeof ResizeObserver;
    try {
      const { container } = render(<PhSolubilityChart doseLineMgPerMl={null} series={series} />);
      const box = screen.getByRole('img', { name: /Solubility against pH/ });
      const mine = watched.filter((w) => w.target === box);
      expect(mine).toHaveLength(1);
      act(() =>
        mine[0]!.cb([{ contentRect: { width: 1013.6 } } as ResizeObserverEntry], {} as never),
      );
      expect(chartWidth(container)).toBe(1013);
    } finally {
      globalThis.ResizeObserver = original;
    }
  });

  it('keeps a width it is given (the printed sheet)', () => {
    const { container } = render(
      <PhSolubilityChart doseLineMgPerMl={null} series={series} width={640} />,
    );
    expect(chartWidth(container)).toBe(640);
  });
});
