import { useEffect, useId, useMemo, useState } from 'react';
import { PHOTO_ACCEPTED_TYPES, PHOTO_MAX_BYTES, PHOTO_MAX_FILES } from '@shared/constants/photos';
import { CameraIcon } from './icons';

const MB = 1024 * 1024;

/** Checks the files the way the server will, so a wrong pick is named before anything is sent. */
export function checkPhotos(files: readonly File[]): string | undefined {
  if (files.length > PHOTO_MAX_FILES) return `Choose at most ${PHOTO_MAX_FILES} photos.`;
  const wrong = files.find((f) => !(PHOTO_ACCEPTED_TYPES as readonly string[]).includes(f.type));
  if (wrong) return `"${wrong.name}" is not a JPEG, PNG or WebP picture.`;
  const big = files.find((f) => f.size > PHOTO_MAX_BYTES);
  if (big) return `"${big.name}" is larger than ${PHOTO_MAX_BYTES / MB} MB. Choose a smaller one.`;
  return undefined;
}

function Thumb({ file, onRemove }: { file: File; onRemove: () => void }) {
  const url = useMemo(() => URL.createObjectURL(file), [file]);
  useEffect(() => () => URL.revokeObjectURL(url), [url]);
  return (
    <li className="relative">
      <img
        src={url}
        alt={`Chosen photo ${file.name}`}
        className="size-20 rounded-xl object-cover ring-1 ring-line"
      />
      <button
        type="button"
        onClick={onRemove}
        aria-label={`Remove ${file.name}`}
        className="absolute -top-2 -right-2 grid size-8 place-items-center rounded-full bg-ink text-sm font-bold text-surface"
      >
        ×
      </button>
    </li>
  );
}

/** Pick up to PHOTO_MAX_FILES pictures from the camera or the gallery; the caller uploads them after saving. */
export function PhotoPicker({
  label,
  hint,
  files,
  onChange,
  disabled,
}: {
  label: string;
  hint?: string;
  files: File[];
  onChange: (files: File[]) => void;
  disabled?: boolean;
}) {
  const id = useId();
  const [error, setError] = useState<string>();
  return (
    <div>
      <p className="text-sm font-bold text-ink-soft">{label}</p>
      {hint ? <p className="text-sm text-ink-muted">{hint}</p> : null}
      <div className="mt-2 flex flex-wrap items-center gap-3">
        {files.length ? (
          <ul className="flex flex-wrap gap-3">
            {files.map((f, i) => (
              <Thumb
                key={`${f.name}-${i}`}
                file={f}
                onRemove={() => onChange(files.filter((_, j) => j !== i))}
              />
            ))}
          </ul>
        ) : null}
        {files.length < PHOTO_MAX_FILES ? (
          <label
            htmlFor={id}
            className={`inline-flex min-h-touch cursor-pointer items-center gap-2 rounded-full bg-surface px-4 font-bold text-ink-soft ring-1 ring-line-strong hover:bg-tint ${disabled ? 'pointer-events-none opacity-50' : ''}`}
          >
            <CameraIcon /> {files.length ? 'Add another' : 'Add a photo'}
          </label>
        ) : null}
        <input
          id={id}
          type="file"
          accept={PHOTO_ACCEPTED_TYPES.join(',')}
          multiple
          disabled={disabled}
          className="sr-only"
          onChange={(e) => {
            const next = [...files, ...Array.from(e.target.files ?? [])];
            e.target.value = '';
            const problem = checkPhotos(next);
            setError(problem);
            if (!problem) onChange(next);
          }}
        />
      </div>
      {error ? (
        <p role="alert" className="mt-1 text-sm font-semibold text-danger">
          {error}
        </p>
      ) : null}
    </div>
  );
}
