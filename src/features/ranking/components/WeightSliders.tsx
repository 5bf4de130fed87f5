import { useEffect, useId, useRef } from 'react';
import { CRITERIA, type ScreeningWeights } from '@/chem';
import { CRITERION_TEXT } from '@/screening-data/criteria';

/** One slider per criterion; the ranking re-orders while a slider moves. */
export function WeightSliders({
  weights,
  onChange,
  onReset,
  onSettle,
}: {
  weights: ScreeningWeights;
  onChange: (w: ScreeningWeights) => void;
  onReset: () => void;
  /** A movement ended: the slider's native `change` (pointer released, key step, typed value). */
  onSettle?: () => void;
}) {
  const uid = useId();
  // React's onChange is the native `input` event; the end of a movement is the native `change`.
  const box = useRef<HTMLFieldSetElement>(null);
  const settle = useRef(onSettle);
  settle.current = onSettle;
  useEffect(() => {
    const el = box.current;
    if (!el) return;
    const end = () => settle.current?.();
    el.addEventListener('change', end);
    return () => el.removeEventListener('change', end);
  }, []);
  const total = CRITERIA.reduce((s, k) => s + weights[k], 0);
  return (
    <fieldset className="weights" ref={box}>
      <legend>Weights</legend>
      <p className="field-hint">
        Each criterion scores 0–1; the score is the weighted mean (its bar in the table is split in
        these colours). Drag to see the order change.{' '}
        {total === 0 ? 'All weights are zero: nothing is ranked by merit.' : ''}
      </p>
      {CRITERIA.map((k, i) => {
        const id = `${uid}-${k}`;
        const share = total > 0 ? (weights[k] / total) * 100 : 0;
        return (
          <div className="weight-row" key={k}>
            <label htmlFor={id} title={CRITERION_TEXT[k].means}>
              <span className={`swatch part-${i}`} aria-hidden="true" />
              {CRITERION_TEXT[k].label}
            </label>
            <input
              id={id}
              type="range"
              min={0}
              max={3}
              step={0.1}
              value={weights[k]}
              aria-valuetext={`${weights[k].toFixed(1)}, ${share.toFixed(0)} % of the score`}
              onChange={(e) => onChange({ ...weights, [k]: Number(e.target.value) })}
            />
            <output htmlFor={id} className="weight-value">
              {weights[k].toFixed(1)} <span className="muted">({share.toFixed(0)} %)</span>
            </output>
          </div>
        );
      })}
      <div className="button-row">
        <button type="button" onClick={onReset}>
          Default weights
        </button>
      </div>
    </fieldset>
  );
}
