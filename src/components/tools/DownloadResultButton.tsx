/**
 * Under a tool's result: download the saved-result object (the shape a class journal entry stores) as a JSON
 * file, or save it to the class journal.
 */
import type { SavedResult } from '../../lib/analysis/saved-result';
import SaveToJournal from './SaveToJournal';

/** A button that downloads `savedResult` as `<tool>-result.json`, and the journal's save button. */
export default function DownloadResultButton({ savedResult }: { savedResult: SavedResult }) {
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
      <SaveToJournal savedResult={savedResult} />
    </div>
  );
}
