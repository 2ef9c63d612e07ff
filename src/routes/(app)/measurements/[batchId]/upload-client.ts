/**
 * Browser side of the measurement upload: XMLHttpRequest (for upload progress events) to the API,
 * which streams newline-delimited JSON: progress lines, then one `done` or `error` line.
 */
export type UploadState =
  | { phase: 'idle' }
  | { phase: 'sending'; percent: number }
  | { phase: 'parsing' }
  | { phase: 'measuring'; done: number; total: number }
  | { phase: 'saving' }
  | { phase: 'done'; parts: number; warnings: string[] }
  | { phase: 'error'; message: string; issues: { line: number | null; message: string }[] };

type StreamLine =
  | { type: 'progress'; phase: 'parsing' | 'saving' }
  | { type: 'progress'; phase: 'measuring'; done: number; total: number }
  | { type: 'done'; result: { parts: number; warnings: string[] } }
  | { type: 'error'; error: string; issues?: { line: number | null; message: string }[] };

function apply(line: StreamLine, set: (s: UploadState) => void): void {
  if (line.type === 'progress')
    set(line.phase === 'measuring' ? { phase: 'measuring', done: line.done, total: line.total } : { phase: line.phase });
  else if (line.type === 'done') set({ phase: 'done', parts: line.result.parts, warnings: line.result.warnings });
  else set({ phase: 'error', message: line.error, issues: line.issues ?? [] });
}

export function uploadWithProgress(url: string, body: FormData, set: (s: UploadState) => void): Promise<void> {
  return new Promise((resolve) => {
    const xhr = new XMLHttpRequest();
    let seen = 0;
    let finished = false;
    const readLines = () => {
      const text = xhr.responseText;
      const end = text.lastIndexOf('\n');
      if (end < seen) return;
      for (const raw of text.slice(seen, end).split('\n')) {
        if (!raw.trim()) continue;
        try {
          const line = JSON.parse(raw) as StreamLine;
          if (line.type !== 'progress') finished = true;
          apply(line, set);
        } catch {
          // A partial or foreign line: ignore it; the final status decides.
        }
      }
      seen = end + 1;
    };
    xhr.upload.onprogress = (e) => {
      if (e.lengthComputable) set({ phase: 'sending', percent: Math.round((100 * e.loaded) / e.total) });
    };
    xhr.upload.onload = () => set({ phase: 'parsing' });
    xhr.onprogress = readLines;
    xhr.onload = () => {
      if (xhr.status === 200) readLines();
      if (!finished) {
        let message = `The upload failed (HTTP ${xhr.status}).`;
        if (xhr.status === 413) message = 'The file is larger than the server accepts.';
        else {
          try {
            message = (JSON.parse(xhr.responseText) as { error?: string }).error ?? message;
          } catch {
            // not JSON: keep the status message
          }
        }
        set({ phase: 'error', message, issues: [] });
      }
      resolve();
    };
    xhr.onerror = () => {
      set({ phase: 'error', message: 'The connection failed during the upload; nothing was saved.', issues: [] });
      resolve();
    };
    xhr.open('POST', url);
    xhr.setRequestHeader('accept', 'application/x-ndjson');
    xhr.send(body);
  });
}
