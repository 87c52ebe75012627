'use client';

import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useRef, useState } from 'react';
import { ApiClientError } from '@/components/ui/api-client';
import { variantsApi } from './api';
import { btn, input } from './styles';
import { refetchAfterWrite } from '@/components/ui/refetch-after-write';

/** Largest design file accepted from disk; the API refuses bodies over 1 MB anyway. */
const MAX_FILE_BYTES = 900 * 1024;

/**
 * Adds a variant from a design file on disk (a download from here or elsewhere). The server validates
 * and migrates it; a refusal names the field at fault, e.g. `design.objects[2].uvbAt30`.
 */
export function UploadVariant({
  designId,
  onCreated,
}: {
  designId: number;
  onCreated?: (id: number) => void;
}) {
  const qc = useQueryClient();
  const file = useRef<HTMLInputElement>(null);
  const [name, setName] = useState('');
  const [localError, setLocalError] = useState<string | null>(null);
  const upload = useMutation({
    mutationFn: async () => {
      const f = file.current?.files?.[0];
      if (!f) throw new ApiClientError(400, 'invalid', 'Choose a design file (.json) first.');
      if (f.size > MAX_FILE_BYTES)
        throw new ApiClientError(413, 'too_large', 'That file is too large to be a design file.');
      let design: unknown;
      try {
        design = JSON.parse(await f.text());
      } catch {
        throw new ApiClientError(400, 'invalid', `${f.name} is not a JSON file.`);
      }
      const variantName =
        name.trim() || f.name.replace(/(\.baskwell)?\.json$/i, '').slice(0, 120) || 'Uploaded';
      return variantsApi.create(designId, { name: variantName, design });
    },
    onSuccess: ({ variant }) => {
      setName('');
      if (file.current) file.current.value = '';
      onCreated?.(variant.id);
      return refetchAfterWrite(qc, ['design', designId]);
    },
  });
  // Say plainly that nothing was added, then the server's reason, which names the field at fault.
  const error = localError ?? (upload.error ? `The file was not added. ${upload.error.message}` : null);
  return (
    <form
      className="flex flex-wrap items-center gap-2"
      onSubmit={(e) => {
        e.preventDefault();
        setLocalError(null);
        upload.mutate();
      }}
    >
      <input
        ref={file}
        type="file"
        accept=".json,application/json"
        aria-label="Design file"
        className="text-body"
      />
      <input
        className={input}
        placeholder="Variant name (optional)"
        aria-label="Name of the uploaded variant"
        maxLength={120}
        value={name}
        onChange={(e) => setName(e.target.value)}
      />
      <button type="submit" className={btn.secondary} disabled={upload.isPending}>
        {upload.isPending ? 'Uploading…' : 'Upload as new variant'}
      </button>
      {error && (
        <p role="alert" className="basis-full text-body text-ember-700">
          {error}
        </p>
      )}
    </form>
  );
}
