import { Worker } from 'node:worker_threads';
import type { ResolvedPhase } from '../../../shared/programs/resolve-band.js';
import type { FiguresRequest } from './figures-thread.js';
import type { RunFigures } from './run-figures.js';

type Pending = { resolve: (figures: RunFigures) => void; reject: (error: Error) => void };

/**
 * The server's side of the figures thread (figures-thread.ts): one thread per process, started
 * on first use, answering requests in turn; each request names its database file. A thread that
 * dies fails what it held and is started afresh on the next request. It does not keep the
 * process alive.
 */
class FiguresWorker {
  private worker: Worker | null = null;
  private next = 1;
  private readonly pending = new Map<number, Pending>();

  compute(
    databasePath: string,
    run: { id: string; engineId: string },
    phases: ResolvedPhase[],
  ): Promise<RunFigures> {
    const worker = this.started();
    const id = this.next++;
    const request: FiguresRequest = { id, databasePath, run, phases };
    return new Promise((resolve, reject) => {
      this.pending.set(id, { resolve, reject });
      worker.postMessage(request);
    });
  }

  private started(): Worker {
    if (this.worker) return this.worker;
    const worker = new Worker(new URL('./figures-thread-entry.mjs', import.meta.url));
    worker.unref();
    worker.on('message', (answer: { id: number; figures?: RunFigures; error?: string }) => {
      const waiting = this.pending.get(answer.id);
      this.pending.delete(answer.id);
      if (answer.figures) waiting?.resolve(answer.figures);
      else waiting?.reject(new Error(answer.error ?? 'The figures thread gave no answer.'));
    });
    const fail = (error: Error) => {
      if (this.worker === worker) this.worker = null;
      for (const waiting of this.pending.values()) waiting.reject(error);
      this.pending.clear();
    };
    worker.on('error', fail);
    worker.on('exit', (code) => fail(new Error(`The figures thread stopped (exit ${code}).`)));
    this.worker = worker;
    return worker;
  }
}

export const figuresWorker = new FiguresWorker();
