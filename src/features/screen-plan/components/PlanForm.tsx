import { useState } from 'react';
import {
  CRYSTALLISATION_METHODS,
  PLATE_SIZES,
  SOLVENTS,
  type PlatePlanInput,
  type PlateSize,
  type StockSolution,
} from '@/chem';
import { FieldMessage } from '@/components/FieldMessage';
import type { CandidateRecord } from '@/persistence/records';
import { candidateLabel } from '@/screening-data/candidate-label';

/** A number field that hands on only valid values and keeps what the user typed meanwhile. */
function NumberField({
  id,
  label,
  value,
  min,
  max,
  unit,
  onValid,
}: {
  id: string;
  label: string;
  value: number;
  min: number;
  max: number;
  unit: string;
  onValid: (x: number) => void;
}) {
  const [text, setText] = useState(String(value));
  const x = Number(text);
  const bad = text.trim() === '' || !Number.isFinite(x) || x <= min || x > max;
  return (
    <label className="plan-field">
      {label}
      <input
        id={id}
        inputMode="decimal"
        value={text}
        aria-invalid={bad}
        aria-describedby={bad ? `${id}-error` : undefined}
        onChange={(e) => {
          setText(e.target.value);
          const y = Number(e.target.value);
          if (e.target.value.trim() !== '' && Number.isFinite(y) && y > min && y <= max) onValid(y);
        }}
      />
      <FieldMessage id={id} error={bad ? `Above ${min} and at most ${max} ${unit}.` : null} />
    </label>
  );
}

const toggle = (list: readonly string[], id: string, on: boolean) =>
  on ? [...list.filter((x) => x !== id), id] : list.filter((x) => x !== id);

/** Parse "0.5, 1.05" into equivalents levels; blank means the default of each salt. */
export function parseEquivalents(text: string): number[] | undefined | null {
  if (text.trim() === '') return undefined;
  const xs = text
    .split(/[,;\s]+/)
    .filter(Boolean)
    .map(Number);
  return xs.length <= 4 && xs.every((x) => Number.isFinite(x) && x > 0 && x <= 4) ? xs : null;
}

type FormProps = {
  draft: PlatePlanInput;
  candidates: readonly CandidateRecord[];
  ionNames: Record<string, string>;
  onChange: (next: PlatePlanInput) => void;
};

function IonsAndSolvents({ draft, candidates, ionNames, onChange }: FormProps) {
  const set = (patch: Partial<PlatePlanInput>) => onChange({ ...draft, ...patch });
  const solvents = SOLVENTS.filter((s) => s.ichQ3cClass !== 1 || draft.allowClass1);
  const withoutClass1 = draft.solvents.filter(
    (id) => SOLVENTS.find((s) => s.id === id)?.ichQ3cClass !== 1,
  );
  return (
    <>
      <fieldset>
        <legend>Counter-ions (from the shortlist)</legend>
        {candidates.map((c) => (
          <label key={c.id} className="plan-check">
            <input
              type="checkbox"
              checked={draft.counterIons.includes(c.ionId)}
              onChange={(e) =>
                set({ counterIons: toggle(draft.counterIons, c.ionId, e.target.checked) })
              }
            />
            {candidateLabel(c, ionNames[c.ionId])}
          </label>
        ))}
      </fieldset>
      <fieldset>
        <legend>Solvents (ICH Q3C class)</legend>
        {solvents.map((s) => (
          <label key={s.id} className="plan-check">
            <input
              type="checkbox"
              checked={draft.solvents.includes(s.id)}
              onChange={(e) => set({ solvents: toggle(draft.solvents, s.id, e.target.checked) })}
            />
            {s.name} ({s.ichQ3cClass ?? '—'}
            {s.ichQ3cClass === 2 ? `, PDE ${s.ichPdeMgPerDay} mg/day` : ''})
          </label>
        ))}
        <label className="plan-check plan-class1">
          <input
            type="checkbox"
            checked={draft.allowClass1 === true}
            onChange={(e) =>
              set({
                allowClass1: e.target.checked,
                solvents: e.target.checked ? draft.solvents : withoutClass1,
              })
            }
          />
          Show Class 1 solvents (ICH Q3C: not to be used in making drug substances)
        </label>
      </fieldset>
    </>
  );
}

function Methods({ draft, onChange }: Pick<FormProps, 'draft' | 'onChange'>) {
  return (
    <fieldset>
      <legend>Methods</legend>
      {CRYSTALLISATION_METHODS.map((m) => (
        <label key={m} className="plan-check">
          <input
            type="checkbox"
            checked={(draft.methods ?? ['slurry']).includes(m)}
            onChange={(e) => {
              const next = toggle(draft.methods ?? ['slurry'], m, e.target.checked);
              onChange({
                ...draft,
                methods: CRYSTALLISATION_METHODS.filter((x) => next.includes(x)),
              });
            }}
          />
          {m}
        </label>
      ))}
    </fieldset>
  );
}

function MethodsAndAmounts({ draft, onChange }: FormProps) {
  const set = (patch: Partial<PlatePlanInput>) => onChange({ ...draft, ...patch });
  const [eqText, setEqText] = useState(
    Array.isArray(draft.equivalents)
      ? draft.equivalents.join(', ')
      : typeof draft.equivalents === 'number'
        ? String(draft.equivalents)
        : '',
  );
  const eqParsed = parseEquivalents(eqText);
  return (
    <>
      <Methods draft={draft} onChange={onChange} />
      <fieldset className="plan-amounts">
        <legend>Amounts and plate</legend>
        <NumberField
          id="plan-api"
          label="Drug per well (mg)"
          value={draft.apiMgPerWell}
          min={0}
          max={1000}
          unit="mg"
          onValid={(x) => set({ apiMgPerWell: x })}
        />
        <NumberField
          id="plan-solvent"
          label="Solvent per well (µL)"
          value={draft.solventUlPerWell}
          min={0}
          max={20000}
          unit="µL"
          onValid={(x) => set({ solventUlPerWell: x })}
        />
        <label className="plan-field">
          Equivalents of acid or base
          <input
            id="plan-eq"
            value={eqText}
            placeholder="per salt: 1.05 (1:1), 0.5 (2:1)"
            aria-invalid={eqParsed === null}
            aria-describedby={eqParsed === null ? 'plan-eq-error' : 'plan-eq-hint'}
            onChange={(e) => {
              setEqText(e.target.value);
              const p = parseEquivalents(e.target.value);
              if (p !== null) set({ equivalents: p });
            }}
          />
          <FieldMessage
            id="plan-eq"
            error={
              eqParsed === null ? 'Up to four numbers above 0 and at most 4, e.g. 0.5, 1.05.' : null
            }
            hint="Blank: each salt’s own (1.05 eq for 1:1, common practice; 0.5 eq of a diacid for 2:1). Several levels multiply the wells."
          />
        </label>
        <label className="plan-field">
          Plate
          <select
            value={draft.plate}
            onChange={(e) => set({ plate: Number(e.target.value) as PlateSize })}
          >
            {PLATE_SIZES.map((n) => (
              <option key={n} value={n}>
                {n} wells
              </option>
            ))}
          </select>
        </label>
      </fieldset>
    </>
  );
}

function Stocks({ draft, ionNames, onChange }: FormProps) {
  const solvents = SOLVENTS.filter((s) => s.ichQ3cClass !== 1 || draft.allowClass1);
  const setStock = (ionId: string, stock: StockSolution | null) => {
    const next = { ...(draft.stock ?? {}) };
    if (stock) next[ionId] = stock;
    else delete next[ionId];
    onChange({ ...draft, stock: next });
  };
  return (
    <fieldset>
      <legend>Stock solutions (instead of weighing or pipetting neat)</legend>
      {draft.counterIons.map((id) => {
        const stock = draft.stock?.[id];
        const name = ionNames[id] ?? id;
        return (
          <div key={id} className="plan-stock">
            <label className="plan-check">
              <input
                type="checkbox"
                checked={!!stock}
                onChange={(e) =>
                  setStock(id, e.target.checked ? { solvent: 'water', molar: 1 } : null)
                }
              />
              {name} from a stock
            </label>
            {stock ? (
              <>
                <select
                  aria-label={`Stock solvent for ${name}`}
                  value={stock.solvent}
                  onChange={(e) => setStock(id, { ...stock, solvent: e.target.value })}
                >
                  {solvents.map((s) => (
                    <option key={s.id} value={s.id}>
                      {s.name}
                    </option>
                  ))}
                </select>
                <NumberField
                  id={`plan-stock-${id}`}
                  label="mol/L"
                  value={stock.molar}
                  min={0}
                  max={20}
                  unit="mol/L"
                  onValid={(x) => setStock(id, { ...stock, molar: x })}
                />
              </>
            ) : null}
          </div>
        );
      })}
    </fieldset>
  );
}

/** The plan's choices: counter-ions from the shortlist, solvents, equivalents, methods, amounts, plate, stocks. */
export function PlanForm(props: FormProps) {
  return (
    <form
      className="plan-form"
      onSubmit={(e) => e.preventDefault()}
      aria-label="Plan of the salt screen"
    >
      <IonsAndSolvents {...props} />
      <MethodsAndAmounts {...props} />
      <Stocks {...props} />
    </form>
  );
}
