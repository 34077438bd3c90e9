/**
 * Saves the saved-result object (the shape a class journal entry will store) as a JSON file on the
 * teacher's computer; class journals are not built yet, so nothing is sent anywhere.
 */
import { useId } from 'react';
import type { SavedResult } from '../../lib/analysis/saved-result';

/** A button that downloads `savedResult` as `<tool>-result.json`, with the journal note beside it. */
export default function DownloadResultButton({ savedResult }: { savedResult: SavedResult }) {
  const noteId = useId();
  const download = () => {
    const blob = new Blob([JSON.stringify(savedResult, null, 2)], { type: 'application/json' });
    const url = URL.createObjectURL(blob);
    const a = document.createElement('a');
    a.href = url;
    a.download = `${savedResult.tool}-result.json`;
    a.click();
    setTimeout(() => URL.revokeObjectURL(url), 0);
  };
  return (
    <div className="no-print flex flex-wrap items-center gap-3">
      <button type="button" className="btn-secondary" onClick={download}>
        Download result (JSON)
      </button>
      <button type="button" className="btn-secondary" disabled aria-describedby={noteId}>
        Save to class journal
      </button>
      <span id={noteId} className="text-sm text-ink-soft">
        Class journals arrive with the journal feature.
      </span>
    </div>
  );
}
