import { useEffect, useRef, useState } from 'react';
import { useLiveQuery } from 'dexie-react-hooks';
import { ChemInputError } from '@/chem';
import { candidatesRepo } from '@/persistence/candidates-repo';
import { customIonsRepo } from '@/persistence/custom-ions-repo';
import { measurementsRepo } from '@/persistence/measurements-repo';
import type {
  CandidateRecord,
  CustomIonRecord,
  MeasurementRecord,
  ProjectRecord,
} from '@/persistence/records';
import {
  computeProjectScreening,
  screeningInputsKey,
  type ProjectScreening,
} from './compute-screening';

/** Names of the compound's fields as the Compound area labels them. */
const FIELD_LABELS: Record<string, string> = {
  intrinsicSolubilityMgPerMl: 'Intrinsic solubility S₀',
  meltingPointC: 'Melting point',
  logP: 'log P',
  doseMg: 'Highest single dose',
  smiles: 'Structure (SMILES)',
  formula: 'Molecular formula',
  ionCharge: 'Charge of the salt-forming ion',
  pKas: 'pKa values',
};

/** A core error as a person reads it: the field's on-screen name instead of its code name. */
export function readableError(err: unknown): string {
  if (err instanceof ChemInputError) {
    const label = FIELD_LABELS[err.field] ?? err.field;
    return `${label}: ${err.message.slice(err.field.length + 2)}`;
  }
  return err instanceof Error ? err.message : String(err);
}

/** What the screening hook returns: a status, the result when ready, a message when not. */
export interface ScreeningState {
  status: 'loading' | 'ready' | 'error';
  result?: ProjectScreening;
  error?: string;
}

/**
 * Screen a project (SCREENING's `screenCompound` through `@/chem`, with the structure parsed and the
 * thermochemistry attached): given the project and its candidates, measurements and custom ions,
 * returns `{ status: 'loading' | 'ready' | 'error'; result?; error? }`. The work re-runs only when
 * something the physics depends on changes (not when a weight moves). While a new run is in
 * flight the previous result stays available with status 'loading'. Reused by the comparison sheet.
 */
export function useScreening(
  project: ProjectRecord | undefined,
  candidates: readonly CandidateRecord[] | undefined,
  measurements: readonly MeasurementRecord[] | undefined,
  customIons: readonly CustomIonRecord[] | undefined,
): ScreeningState {
  const [state, setState] = useState<ScreeningState>({ status: 'loading' });
  const runRef = useRef(0);
  const ready = project && candidates && measurements && customIons;
  const key = ready ? screeningInputsKey({ project, candidates, measurements, customIons }) : null;

  useEffect(() => {
    if (!ready || key === null) return;
    const run = ++runRef.current;
    setState((s) => ({ status: 'loading', result: s.result }));
    computeProjectScreening({ project, candidates, measurements, customIons })
      .then((result) => {
        if (run === runRef.current) setState({ status: 'ready', result });
      })
      .catch((err: unknown) => {
        if (run === runRef.current) setState({ status: 'error', error: readableError(err) });
      });
    // `key` stands for every input the physics reads.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [key]);

  if (!ready) return { status: 'loading' };
  return state;
}

/** The project's shortlist, measurements and custom ions, live from the database. */
export function useProjectRecords(projectId: string | undefined) {
  return useLiveQuery(async () => {
    if (!projectId) return undefined;
    const [candidates, measurements, customIons] = await Promise.all([
      candidatesRepo.listForProject(projectId),
      measurementsRepo.listForProject(projectId),
      customIonsRepo.listAll(),
    ]);
    measurements.sort((a, b) => a.recordedAt.localeCompare(b.recordedAt));
    return { candidates, measurements, customIons };
  }, [projectId]);
}

/** `useScreening` for a project, reading its records itself. */
export function useProjectScreening(project: ProjectRecord | undefined): ScreeningState & {
  candidates?: CandidateRecord[];
  measurements?: MeasurementRecord[];
} {
  const records = useProjectRecords(project?.id);
  const state = useScreening(
    project,
    records?.candidates,
    records?.measurements,
    records?.customIons,
  );
  return { ...state, candidates: records?.candidates, measurements: records?.measurements };
}
