import { useState, type FormEvent } from 'react';
import { ApiError, apiUpload } from '../../lib/http/client';
import { MESH_FILE_BYTES_MAX, MESH_TRIANGLES_MAX } from '../../lib/mesh/mesh-limits';
import { IMPORTED_MODEL_TITLE_MAX, type ImportedModelView } from '../../lib/models/imported-model-inputs';
import { FormAlert } from '../auth/FormAlert';
import FieldShell from '../tools/FieldShell';
import TextField from '../tools/TextField';

const MB = 1_000_000;
const ACCEPT = '.stl,.obj';
const LIMITS_SENTENCE = `An STL (binary or ASCII) or OBJ file, at most ${MESH_FILE_BYTES_MAX / MB} MB and ${MESH_TRIANGLES_MAX.toLocaleString('en-US')} triangles.`;

/** Where the upload is: choosing, sending the file (share sent), or the server checking the mesh. */
type Stage = { kind: 'idle' } | { kind: 'sending'; share: number } | { kind: 'checking' };

/** What is wrong with a chosen file before it is sent, or null. */
function fileProblem(file: File | null): string | null {
  if (!file) return 'Choose a .stl or .obj file first.';
  if (!/\.(stl|obj)$/i.test(file.name)) return `“${file.name}” is not a .stl or .obj file. ${LIMITS_SENTENCE}`;
  if (file.size === 0) return `“${file.name}” is empty (0 bytes).`;
  if (file.size > MESH_FILE_BYTES_MAX)
    return `“${file.name}” is ${(file.size / MB).toFixed(1)} MB, larger than ${MESH_FILE_BYTES_MAX / MB} MB.`;
  return null;
}

/**
 * Imports a mesh file: the file and an optional title, sent with upload progress; the server checks and repairs
 * the mesh, and on success the model's own page opens with what the check found.
 */
export default function ModelUploadForm() {
  const [file, setFile] = useState<File | null>(null);
  const [title, setTitle] = useState('');
  const [stage, setStage] = useState<Stage>({ kind: 'idle' });
  const [error, setError] = useState<string | null>(null);
  const busy = stage.kind !== 'idle';

  async function submit(e: FormEvent) {
    e.preventDefault();
    const problem = fileProblem(file);
    if (problem || !file) return setError(problem);
    setError(null);
    setStage({ kind: 'sending', share: 0 });
    const form = new FormData();
    if (title.trim()) form.append('title', title.trim());
    form.append('file', file, file.name);
    try {
      const { model } = await apiUpload<{ model: ImportedModelView }>('/api/models/imports', {
        form,
        onProgress: (share) => setStage(share < 1 ? { kind: 'sending', share } : { kind: 'checking' }),
      });
      window.location.assign(`/models/imports/${model.id}`);
    } catch (err) {
      setStage({ kind: 'idle' });
      setError(err instanceof ApiError ? err.message : 'The upload failed; try again.');
    }
  }

  return (
    <form className="card flex flex-col gap-4" onSubmit={(e) => void submit(e)} aria-busy={busy} noValidate>
      <h2 className="text-lg font-bold">Import a mesh</h2>
      <FieldShell label="Mesh file" hint={LIMITS_SENTENCE}>
        {({ id, describedBy }) => (
          <input
            id={id}
            name="file"
            type="file"
            accept={ACCEPT}
            className="mt-2 block text-sm file:mr-3 file:rounded-md file:border file:border-ink/20 file:bg-white file:px-3 file:py-1.5 file:font-semibold file:text-ink"
            disabled={busy}
            aria-describedby={describedBy}
            onChange={(e) => {
              setFile(e.currentTarget.files?.[0] ?? null);
              setError(null);
            }}
          />
        )}
      </FieldShell>
      <TextField
        label="Title (optional)"
        name="title"
        value={title}
        maxLength={IMPORTED_MODEL_TITLE_MAX}
        hint="The file's name when left empty."
        onChange={setTitle}
      />
      <div className="flex flex-wrap items-center gap-3">
        <button type="submit" className="btn-primary" disabled={busy}>
          {busy ? 'Importing…' : 'Import and check'}
        </button>
        {stage.kind === 'sending' && (
          <progress max={1} value={stage.share} aria-label="Sending the file" className="w-40" />
        )}
        <p aria-live="polite" className="text-sm text-ink-soft" data-testid="upload-status">
          {stage.kind === 'sending'
            ? `Sending the file… ${Math.round(stage.share * 100)} %`
            : stage.kind === 'checking'
              ? 'Checking and repairing the mesh… a large file takes a few seconds.'
              : ''}
        </p>
      </div>
      <FormAlert kind="error" message={error} />
    </form>
  );
}
