import { z } from 'zod';
import type { CycleStage, Severity, TriagePart } from '../care';
import { flag } from './tank.schema';

export const deskQuery = z
  .object({
    urgentOnly: flag.optional(),
    cycling: flag.optional(),
    unanswered: flag.optional(),
  })
  .strict();

export interface DeskRow {
  tankId: string;
  name: string;
  owner: { id: string; displayName: string };
  phase: 'cycling' | 'established';
  systemType: string;
  cycleStage: CycleStage;
  lastTestAt: string | null;
  daysSinceTest: number | null;
  unansweredQuestions: number;
  openConcerns: { urgent: number; caution: number; info: number };
  worstConcern: {
    id: string;
    severity: Severity;
    reason: string;
    parameter: string;
    raisedAt: string;
    status: 'open' | 'acknowledged';
  } | null;
  /** The worst concern's parameter over the last two weeks, oldest first (canonical units). */
  sparkline: { parameter: string; unit: string; points: { at: string; value: number }[] } | null;
  score: number;
  why: TriagePart[];
}

export interface DeskView {
  rows: DeskRow[];
  /** Rows before the filters, so the page can say "3 of 7 tanks". */
  total: number;
  generatedAt: string;
}
