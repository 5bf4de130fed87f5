import { useMemo } from 'react';
import { validationReport } from '@/chem';
import { SaltSolubilityCheck } from './SaltSolubilityCheck';
import { LatticeModelCheck } from './LatticeModelCheck';
import { EngineCheck } from './EngineCheck';
import '../model-check.css';

/** The engine's validation report, or the reason it could not be computed. */
function useValidationReport() {
  return useMemo(() => {
    try {
      return { ok: true as const, rows: validationReport() };
    } catch (err) {
      return { ok: false as const, error: String(err) };
    }
  }, []);
}

/**
 * Model check: the decision first — the salt-solubility evidence the ranking rests on — then, folded,
 * every thermochemistry model against the published reference data bundled with the workbench (the
 * engine's validation report) and the engine check. Shows where the estimates deserve trust and where
 * they do not.
 */
export function ModelCheckArea() {
  const report = useValidationReport();
  if (!report.ok) {
    return (
      <section className="panel">
        <h2>Model check</h2>
        <p role="alert">The validation report could not be computed: {report.error}</p>
      </section>
    );
  }
  return (
    <div className="confidence-area">
      <h2 id="confidence-title">Model check</h2>
      <SaltSolubilityCheck />
      <LatticeModelCheck models={report.rows} />
      <EngineCheck />
    </div>
  );
}
