import type { WellOutcome, WellOutcomeKind } from './plate-plan.schema';

/**
 * What a screen's recorded outcomes say per counter-ion: wells recorded, crystalline hits (a
 * crystalline solid or a new crystalline form), the best form so far, and whether the counter-ion has
 * given no crystalline salt although every one of its wells is recorded.
 */

/** Order of merit of an outcome (higher is better): a crystalline form beats an amorphous solid, which
 * beats an oil or gum, which beats nothing coming out (common practice in salt screening). */
export const OUTCOME_MERIT: Record<WellOutcomeKind, number> = {
  'clear-solution': 0,
  'oil-or-gum': 1,
  'amorphous-solid': 2,
  'crystalline-solid': 3,
  'new-crystalline-form': 4,
};

export const isCrystalline = (k: WellOutcomeKind) =>
  k === 'crystalline-solid' || k === 'new-crystalline-form';

export interface CounterIonOutcomeSummary {
  counterIonId: string;
  wells: number;
  recorded: number;
  crystallineHits: number;
  /** The best recorded well: highest merit, then the highest melting point (common practice). */
  best: { well: string; outcome: WellOutcomeKind; meltingPointC: number | null } | null;
  /** Every well recorded and none crystalline. */
  noCrystallineSaltYet: boolean;
}

export function summariseOutcomes(
  wells: readonly { well: string; counterIonId: string }[],
  outcomes: Readonly<Record<string, WellOutcome>>,
): CounterIonOutcomeSummary[] {
  const order: string[] = [];
  const byIon = new Map<string, { well: string }[]>();
  for (const w of wells) {
    if (!byIon.has(w.counterIonId)) {
      byIon.set(w.counterIonId, []);
      order.push(w.counterIonId);
    }
    byIon.get(w.counterIonId)!.push(w);
  }
  return order.map((counterIonId) => {
    const ionWells = byIon.get(counterIonId)!;
    const recorded = ionWells.flatMap((w) =>
      outcomes[w.well] ? [{ well: w.well, ...outcomes[w.well]! }] : [],
    );
    const hits = recorded.filter((r) => isCrystalline(r.outcome));
    const best = [...recorded].sort(
      (a, b) =>
        OUTCOME_MERIT[b.outcome] - OUTCOME_MERIT[a.outcome] ||
        (b.meltingPointC ?? -Infinity) - (a.meltingPointC ?? -Infinity),
    )[0];
    return {
      counterIonId,
      wells: ionWells.length,
      recorded: recorded.length,
      crystallineHits: hits.length,
      best: best
        ? { well: best.well, outcome: best.outcome, meltingPointC: best.meltingPointC }
        : null,
      noCrystallineSaltYet: recorded.length === ionWells.length && hits.length === 0,
    };
  });
}
