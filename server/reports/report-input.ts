/**
 * What a report is made from: the coil document, its solve result, the identification the server knows
 * (project, version, review decision) and the reader's choices (unit system, paper size).
 */
import type { CoilDocument, SolveResult } from '@/lib/engine/types';
import type { UnitSystem } from '@/lib/units';
import type { Paper } from '@/server/reports/pdf-layout';

export interface ReportDecision {
  /** For example "approved", "changes requested". */
  status: string;
  by: string;
  at: string | Date;
  note?: string;
}

export interface ReportMetadata {
  projectName: string;
  client?: string;
  coilName: string;
  versionNumber?: number;
  versionMessage?: string;
  decision?: ReportDecision;
  preparedBy: string;
  date: string | Date;
}

export interface ReportOptions {
  units: UnitSystem;
  paper: Paper;
}

export interface DatasheetInput {
  document: CoilDocument;
  result: SolveResult;
  metadata: ReportMetadata;
  options: ReportOptions;
}

/** A calendar date as YYYY-MM-DD (ISO 8601), which reads the same everywhere; text that is not a date is kept. */
export function isoDate(value: string | Date): string {
  const d = value instanceof Date ? value : new Date(value);
  if (Number.isNaN(d.getTime())) return String(value);
  return d.toISOString().slice(0, 10);
}
