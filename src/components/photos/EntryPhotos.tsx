import { useState } from 'react';
import { apiSettle } from '../../lib/http/client';
import {
  ENTRY_PHOTOS_MAX,
  PHOTO_ACCEPTED_SENTENCE,
  PHOTO_ACCEPTED_TYPES,
  PHOTO_ALT_TEXT_MAX,
  PHOTO_BYTES_MAX,
  PHOTO_RELEASE_STATEMENT,
  photoUploadBatches,
  type EntryPhotoView,
} from '../../lib/photos/photo-rules';
import { FormAlert } from '../auth/FormAlert';

interface Props {
  entryId: string;
  photos: EntryPhotoView[];
  /** True on the author side while the entry is a draft or returned: upload, describe, delete. */
  editable: boolean;
}

interface Chosen {
  file: File;
  altText: string;
}

/**
 * An entry's photos: thumbnails with their descriptions and, while the entry can change, adding photos (sent in
 * requests under the upload limit), describing and deleting them. The server checks and re-encodes every photo.
 */
export default function EntryPhotos({ entryId, photos: initial, editable }: Props) {
  const [photos, setPhotos] = useState(initial);
  const [chosen, setChosen] = useState<Chosen[]>([]);
  const [busy, setBusy] = useState(false);
  const [message, setMessage] = useState<{ kind: 'error' | 'success'; text: string } | null>(null);
  const room = ENTRY_PHOTOS_MAX - photos.length;

  function choose(files: FileList | null) {
    const list = [...(files ?? [])];
    const tooBig = list.filter((f) => f.size > PHOTO_BYTES_MAX).map((f) => f.name);
    if (list.length > room) {
      setMessage({ kind: 'error', text: `This entry has room for ${room} more photo(s). ${PHOTO_ACCEPTED_SENTENCE}` });
    } else if (tooBig.length > 0) {
      setMessage({ kind: 'error', text: `Too large: ${tooBig.join(', ')}. ${PHOTO_ACCEPTED_SENTENCE}` });
    } else {
      setMessage(null);
    }
    setChosen(list.slice(0, Math.max(0, room)).map((file) => ({ file, altText: '' })));
  }

  async function upload() {
    setBusy(true);
    setMessage(null);
    let sent = 0;
    for (const batch of photoUploadBatches(chosen.map((c) => c.file.size))) {
      const form = new FormData();
      for (const i of batch) {
        form.append('altText', chosen[i]!.altText);
        form.append('photo', chosen[i]!.file, chosen[i]!.file.name);
      }
      const result = await apiSettle<{ photos: EntryPhotoView[] }>(`/api/entries/${entryId}/photos`, { form });
      if (!result.ok) {
        setMessage({ kind: 'error', text: result.error.message });
        // The groups before this one are stored; keep this one and the rest to send again.
        setChosen(chosen.filter((_, i) => i >= batch[0]!));
        setBusy(false);
        return;
      }
      setPhotos(result.data.photos);
      sent += batch.length;
    }
    setChosen([]);
    setBusy(false);
    setMessage({ kind: 'success', text: `${sent} photo(s) added, without their location or camera details.` });
  }

  async function describe(photo: EntryPhotoView, altText: string) {
    if (altText === photo.altText) return;
    const result = await apiSettle<{ photo: EntryPhotoView }>(`/api/photos/${photo.id}`, {
      method: 'PATCH',
      body: { altText },
    });
    if (result.ok) setPhotos((list) => list.map((p) => (p.id === photo.id ? result.data.photo : p)));
    else setMessage({ kind: 'error', text: result.error.message });
  }

  async function remove(photo: EntryPhotoView) {
    if (!window.confirm('Delete this photo from the entry?')) return;
    const result = await apiSettle<{ ok: true }>(`/api/photos/${photo.id}`, { method: 'DELETE' });
    if (result.ok) setPhotos((list) => list.filter((p) => p.id !== photo.id));
    else setMessage({ kind: 'error', text: result.error.message });
  }

  return (
    <section className="space-y-4" aria-labelledby={`photos-${entryId}`}>
      <h2 id={`photos-${entryId}`} className="text-lg font-semibold">
        Photos ({photos.length} of {ENTRY_PHOTOS_MAX})
      </h2>
      {photos.length === 0 && <p className="text-ink-soft">No photos yet.</p>}
      <ul className="grid grid-cols-2 gap-4 sm:grid-cols-3">
        {photos.map((photo) => (
          <li key={photo.id} className="space-y-2" data-testid="entry-photo">
            <a href={photo.url} target="_blank" rel="noopener">
              <img
                src={photo.thumbnailUrl}
                alt={photo.altText}
                width={photo.thumbnailWidthPx}
                height={photo.thumbnailHeightPx}
                loading="lazy"
                className="h-auto w-full rounded"
              />
            </a>
            {editable ? (
              <>
                <label className="field-label" htmlFor={`alt-${photo.id}`}>
                  What the photo shows
                </label>
                <input
                  id={`alt-${photo.id}`}
                  className="field-input"
                  defaultValue={photo.altText}
                  maxLength={PHOTO_ALT_TEXT_MAX}
                  onBlur={(e) => void describe(photo, e.currentTarget.value.trim())}
                />
                <button type="button" className="btn-secondary" onClick={() => void remove(photo)}>
                  Delete photo
                </button>
              </>
            ) : (
              photo.altText && <p className="text-sm text-ink-soft">{photo.altText}</p>
            )}
          </li>
        ))}
      </ul>
      {editable && room > 0 && (
        <div className="space-y-3">
          <label className="field-label" htmlFor={`add-${entryId}`}>
            Add photos (up to {room} more)
          </label>
          <input
            id={`add-${entryId}`}
            type="file"
            multiple
            accept={PHOTO_ACCEPTED_TYPES.join(',')}
            onChange={(e) => choose(e.currentTarget.files)}
            disabled={busy}
          />
          <p className="text-sm text-ink-soft">{PHOTO_ACCEPTED_SENTENCE}</p>
          {chosen.map((c, i) => (
            <div key={`${c.file.name}-${i}`}>
              <label className="field-label" htmlFor={`new-alt-${i}`}>
                What “{c.file.name}” shows
              </label>
              <input
                id={`new-alt-${i}`}
                className="field-input"
                maxLength={PHOTO_ALT_TEXT_MAX}
                value={c.altText}
                onChange={(e) => {
                  const altText = e.currentTarget.value;
                  setChosen((list) => list.map((x, j) => (j === i ? { ...x, altText } : x)));
                }}
              />
            </div>
          ))}
          {chosen.length > 0 && (
            <button type="button" className="btn-primary" onClick={() => void upload()} disabled={busy}>
              {busy ? 'Uploading…' : `Upload ${chosen.length} photo(s)`}
            </button>
          )}
          <p className="text-sm text-ink-soft">
            Before you submit the entry you will confirm: {PHOTO_RELEASE_STATEMENT}
          </p>
        </div>
      )}
      {message && <FormAlert kind={message.kind} message={message.text} />}
    </section>
  );
}
