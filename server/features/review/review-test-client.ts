import type { Express } from 'express';
import { DEMO, signedInAgent } from '../../../tests/helpers/test-server.js';

/* The runs board as the review tests read it: every row, and one run found by boat and engine. */

export type BoardRow = {
  id: string;
  state: string;
  group: string;
  vessel: { name: string };
  engine: { position: string; serialNumber: string };
  progress: number;
  verdict: string;
  breachCount: number;
  flags: string[];
  firstService: { state: string; hoursSource: string; dueAtHours: number } | null;
};

export async function boardAnswer(
  app: Express,
  query = 'show=all',
): Promise<{
  runs: BoardRow[];
  counts: Record<string, number>;
  actionCount: number;
  total: number;
  matching: number;
}> {
  return (await (await signedInAgent(app, DEMO.technician)).get(`/api/board?${query}`)).body;
}

/** The board's row of the run on this boat (and engine position, for a twin). */
export const runOnBoard = async (app: Express, vessel: string, position?: string) =>
  (await boardAnswer(app)).runs.find(
    (r) => r.vessel.name === vessel && (!position || r.engine.position === position),
  )!;
