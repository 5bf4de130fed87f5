import { useEffect, type ReactNode } from 'react';
import { downloadText } from '@/components/download-text';
import { sheetCsvFileName, sheetToCsv } from '../sheet-csv';
import type { SheetModel } from '../sheet.types';
import { ComparisonSheet } from './ComparisonSheet';
import '../sheet.css';

/**
 * The sheet over the workbench, with its toolbar (screen only): print or save as PDF through the
 * browser's print dialog, download the same table as CSV, close. The document title is set to the
 * compound and date while the sheet is open, so "save as PDF" proposes a meaningful file name.
 */
export function SheetView({
  model,
  status,
  onClose,
  extra,
}: {
  model: SheetModel | null;
  /** Blocks other areas add below the sheet (the salt screen's outcomes). */
  extra?: ReactNode;
  /** Shown instead of the sheet while the ranking is computed or when it failed. */
  status?: string | null;
  onClose: () => void;
}) {
  useEffect(() => {
    if (!model) return;
    const previous = document.title;
    document.title = `${model.compound.name} — salt comparison ${model.generatedAt.slice(0, 10)}`;
    return () => {
      document.title = previous;
    };
  }, [model]);

  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      if (e.key === 'Escape') onClose();
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [onClose]);

  return (
    <div className="sheet-overlay" role="dialog" aria-modal="true" aria-label="Comparison sheet">
      <div className="sheet-toolbar">
        <span className="sheet-toolbar-title">Comparison sheet</span>
        <button type="button" onClick={() => window.print()} disabled={!model}>
          Print or save as PDF
        </button>
        <button
          type="button"
          disabled={!model}
          onClick={() => {
            if (model)
              downloadText(
                sheetCsvFileName(model.projectName, model.generatedAt),
                sheetToCsv(model),
                'text/csv;charset=utf-8',
              );
          }}
        >
          Download CSV
        </button>
        <span className="sheet-toolbar-note">
          Both carry the cautions: estimates screen, they do not establish a salt form.
        </span>
        <button type="button" onClick={onClose}>
          Back to the workbench
        </button>
      </div>
      {model ? (
        <>
          <ComparisonSheet model={model} />
          {extra ? <div className="comparison-sheet sheet-extra">{extra}</div> : null}
        </>
      ) : (
        <p className="comparison-sheet" role="status">
          {status ?? 'Preparing the comparison…'}
        </p>
      )}
    </div>
  );
}
