/**
 * Choosing a CSV file by file input or by dropping it on the box; the file's size is checked against the
 * tool's limit in the browser, so a too-large file is refused before it is read or uploaded.
 */
import { useId, useState, type DragEvent } from 'react';
import { uploadSizeProblem } from '../../lib/tools/upload-check';
import { bytesFormat } from '../../lib/tools/number-format';

interface Props {
  label: string;
  /** What the columns must be, shown under the label. */
  hint: string;
  maxBytes: number;
  onFile: (file: { name: string; text: string }) => void;
  /** An error from the server about the last file sent. */
  error?: string | undefined;
}

/** A labelled CSV file picker with a drop zone and a size check before upload. */
export default function CsvUpload({ label, hint, maxBytes, onFile, error }: Props) {
  const id = useId();
  const [problem, setProblem] = useState<string | null>(null);
  const [over, setOver] = useState(false);
  const take = async (file: File | undefined) => {
    if (!file) return;
    const p = uploadSizeProblem(file.name, file.size, maxBytes);
    setProblem(p);
    if (p) return;
    onFile({ name: file.name, text: await file.text() });
  };
  const drop = (e: DragEvent<HTMLDivElement>) => {
    e.preventDefault();
    setOver(false);
    void take(e.dataTransfer.files[0]);
  };
  const shown = problem ?? error;
  return (
    <div
      className={`no-print rounded-lg border-2 border-dashed p-4 ${over ? 'border-fold bg-fold-light' : 'border-ink/25'}`}
      onDragOver={(e) => {
        e.preventDefault();
        setOver(true);
      }}
      onDragLeave={() => setOver(false)}
      onDrop={drop}
    >
      <label htmlFor={id} className="field-label">
        {label}
      </label>
      <p id={`${id}-hint`} className="mt-0.5 text-sm text-ink-soft">
        {hint} Drop a file here or choose one; at most {bytesFormat(maxBytes)}.
      </p>
      <input
        id={id}
        type="file"
        accept=".csv,.txt,text/csv"
        className="mt-2 block text-sm"
        aria-describedby={[`${id}-hint`, shown ? `${id}-error` : ''].filter(Boolean).join(' ')}
        aria-invalid={shown ? true : undefined}
        onChange={(e) => {
          void take(e.target.files?.[0]);
          e.target.value = '';
        }}
      />
      {shown && (
        <p id={`${id}-error`} className="field-error" role="alert">
          {shown}
        </p>
      )}
    </div>
  );
}
