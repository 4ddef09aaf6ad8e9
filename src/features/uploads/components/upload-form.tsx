/** Upload a file: its kind (study, model, DXF) and the file; the server checks it on arrival and says what is wrong, by path. */
import { useId, useRef, useState, type FormEvent } from 'react';
import type { UploadKind } from '@/lib/api-types';
import { FormError } from '@/components/form-error';
import { BTN_PRIMARY, FIELD } from '@/components/ui';
import { useUpload } from '../api/uploads';

const KINDS: { kind: UploadKind; label: string; accept: string }[] = [
  { kind: 'study', label: 'Study file (JSON)', accept: '.json,application/json' },
  { kind: 'model', label: 'Model file (JSON)', accept: '.json,application/json' },
  { kind: 'dxf', label: 'Drawing (DXF)', accept: '.dxf' },
];

export function UploadForm({ slug }: { slug: string }) {
  const id = useId();
  const [kind, setKind] = useState<UploadKind>('study');
  const [file, setFile] = useState<File>();
  const input = useRef<HTMLInputElement>(null);
  const m = useUpload(slug);
  const submit = (e: FormEvent) => {
    e.preventDefault();
    if (!file) return;
    m.mutate({ file, kind }, {
      onSuccess: () => {
        setFile(undefined);
        if (input.current) input.current.value = '';
      },
    });
  };
  return (
    <form onSubmit={submit} className="flex flex-wrap items-end gap-3 px-3 py-2 text-xs">
      <div>
        <label htmlFor={`${id}-kind`} className="block text-ink-2">Kind</label>
        <select id={`${id}-kind`} value={kind} onChange={(e) => setKind(e.target.value as UploadKind)} className={`mt-1 ${FIELD}`}>
          {KINDS.map((k) => <option key={k.kind} value={k.kind}>{k.label}</option>)}
        </select>
      </div>
      <div>
        <label htmlFor={`${id}-file`} className="block text-ink-2">File</label>
        <input id={`${id}-file`} ref={input} type="file" required accept={KINDS.find((k) => k.kind === kind)?.accept}
          onChange={(e) => setFile(e.target.files?.[0])} className="mt-1 block text-xs file:mr-2 file:rounded file:border file:border-rule-strong file:bg-sheet file:px-2 file:py-0.5" />
      </div>
      <button type="submit" disabled={!file || m.isPending} className={BTN_PRIMARY}>{m.isPending ? 'Uploading…' : 'Upload'}</button>
      {m.isSuccess && (
        <div role="status" className="basis-full text-ok">
          Uploaded <span className="num">{m.data.upload.name}</span>.
          {m.data.warnings.length > 0 && (
            <ul className="m-0 mt-1 pl-4 text-warn">{m.data.warnings.map((w) => <li key={w.path + w.message}><span className="num">{w.path}</span> {w.message}</li>)}</ul>
          )}
        </div>
      )}
      {m.isError && <div className="basis-full"><FormError error={m.error} /></div>}
    </form>
  );
}
