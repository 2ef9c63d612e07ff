/**
 * A small pool of worker threads running one bundled file (the solver's, the measurement reader's): each job
 * goes to the least busy thread as { id, …message }; the thread answers { id, progress } any number of times,
 * then { id, result } or { id, error } (turned back into an error by the pool's `revive`). A crashed thread
 * fails the jobs it held and is replaced. Threads are unref'd: an idle pool never keeps a process alive.
 */
import { Worker } from 'node:worker_threads';

interface Slot {
  worker: Worker;
  busy: Set<number>;
}
interface Pending<R> {
  resolve: (r: R) => void;
  reject: (e: Error) => void;
  onProgress?: (p: never) => void;
}

/** True when this code runs from the built app (build/server/…), where the bundled workers sit beside it. */
export function runsFromBuild(): boolean {
  return import.meta.url.includes('/build/server/');
}

export class ThreadPool<R, E = { name: string; message: string }> {
  private slots: Slot[] | null = null;
  private readonly pending = new Map<number, Pending<R>>();
  private nextId = 1;

  constructor(
    private readonly file: string,
    private readonly size: number,
    private readonly revive: (error: E) => Error
  ) {}

  /** Starts the threads ahead of the first job. */
  warm(): void {
    this.slots ??= Array.from({ length: Math.max(1, this.size) }, () => this.start());
  }

  /** Runs one job on the least busy thread; `transfer` lists buffers moved rather than copied. */
  run<P = never>(message: object, transfer: ArrayBuffer[] = [], onProgress?: (p: P) => void): Promise<R> {
    this.warm();
    const slot = this.slots!.reduce((a, b) => (b.busy.size < a.busy.size ? b : a));
    const id = this.nextId++;
    return new Promise<R>((resolve, reject) => {
      this.pending.set(id, { resolve, reject, onProgress: onProgress as ((p: never) => void) | undefined });
      slot.busy.add(id);
      slot.worker.postMessage({ id, ...message }, transfer);
    });
  }

  async close(): Promise<void> {
    const s = this.slots;
    this.slots = null;
    if (s) await Promise.all(s.map((x) => x.worker.terminate()));
  }

  private start(): Slot {
    const worker = new Worker(this.file);
    worker.unref();
    const slot: Slot = { worker, busy: new Set<number>() };
    worker.on('message', (m: { id: number; progress?: never; result?: R; error?: E }) => {
      const p = this.pending.get(m.id);
      if (!p) return;
      if (m.progress !== undefined) return p.onProgress?.(m.progress);
      slot.busy.delete(m.id);
      this.pending.delete(m.id);
      if (m.error) p.reject(this.revive(m.error));
      else p.resolve(m.result as R);
    });
    worker.on('error', (err) => {
      for (const id of slot.busy) {
        this.pending.get(id)?.reject(err);
        this.pending.delete(id);
      }
      if (this.slots) this.slots = this.slots.map((s) => (s === slot ? this.start() : s));
    });
    return slot;
  }
}
