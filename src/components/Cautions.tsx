import { useEffect, useRef } from 'react';
import { SCREENING_CAUTIONS } from '@/chem';

/**
 * The cautions every ranking is read with: the core's sentences (SCREENING_CAUTIONS in
 * src/chem/report/cautions.ts), shared with the CSV export and the command line. Shown in full in a
 * dialog reachable from every screen, and ONCE per screen: the shell's footer note on every area but
 * Ranking, which lists them in full beside the ranking (tests/app/cautions-once.test.tsx counts them).
 * In full on the sheet and in every export.
 */
export const CAUTION_LINES: readonly string[] = SCREENING_CAUTIONS;

export function CautionNote() {
  return (
    <p className="caution-note" role="note">
      <strong>Screening estimates only.</strong> {CAUTION_LINES[0]} Experiments, the regulatory
      guidance in force and your lab’s safety rules decide.
    </p>
  );
}

export function CautionsDialog({ open, onClose }: { open: boolean; onClose: () => void }) {
  const ref = useRef<HTMLDialogElement>(null);
  useEffect(() => {
    const d = ref.current;
    if (!d) return;
    if (open && !d.open) {
      if (typeof d.showModal === 'function') d.showModal();
      else d.setAttribute('open', '');
    } else if (!open && d.open) {
      if (typeof d.close === 'function') d.close();
      else d.removeAttribute('open');
    }
  }, [open]);
  return (
    <dialog
      ref={ref}
      className="cautions-dialog"
      aria-labelledby="cautions-title"
      onClose={onClose}
    >
      <h2 id="cautions-title">Before you act on a ranking</h2>
      <ul>
        {CAUTION_LINES.map((l) => (
          <li key={l}>{l}</li>
        ))}
      </ul>
      <button type="button" onClick={onClose} autoFocus>
        Understood
      </button>
    </dialog>
  );
}
