/**
 * Reports and exports of a coil's working draft or of a saved version (data sheet PDF, end-face SVG, tube-sheet
 * DXF, CSV tables, the coil document as JSON), and the import of a coil document file. Every member may download;
 * importing creates a coil through the coil service, so it needs the owner or designer role. Another team's coil or
 * version is "not found" (the access checks of access.ts and version-access.ts).
 */
import { findProject } from '@/db/queries/projects';
import { findUserById } from '@/db/queries/users';
import { latestDecisions } from '@/db/queries/versions';
import type { CoilDocument, EndFace, SolveResult } from '@/lib/engine/types';
import type { ImportCoilBody } from '@/lib/schema/api-exports';
import type { UnitSystem } from '@/lib/units';
import {
  billOfMaterialsCsv,
  circuitsCsv,
  renderDatasheetPdf,
  renderEndFaceSvg,
  renderTubeSheetDxf,
  tubesCsv,
  type ReportMetadata,
  type ReportOptions,
} from '@/server/reports';
import { coilAccess, projectAccess } from '@/server/services/access';
import { coilService } from '@/server/services/coils';
import type { ServiceDeps } from '@/server/services/context';
import { versionAccess } from '@/server/services/version-access';
import { solveVersion } from '@/server/services/version-results';

/** What is exported: the coil's working draft, or one saved version. */
export type ExportTarget = { kind: 'coil'; coilId: string } | { kind: 'version'; versionId: string };

/** A file to send: its bytes or text, its media type and a download name made safe from the coil name. */
export interface ExportFile {
  body: Buffer | string;
  contentType: string;
  fileName: string;
}

export type CsvTable = 'circuits' | 'tubes' | 'bill-of-materials';

const CSV_WRITERS: Record<CsvTable, (doc: CoilDocument, result: SolveResult, units: UnitSystem) => string> = {
  circuits: circuitsCsv,
  tubes: tubesCsv,
  'bill-of-materials': billOfMaterialsCsv,
};

const DECISION_WORDS: Record<string, string> = { approved: 'approved', 'changes-requested': 'changes requested' };

/**
 * A file name from a coil name: ASCII letters, digits, dots, dashes and underscores only (no folders, quotes or
 * control characters can reach the header or the reader's disk), at most 80 characters, never empty.
 */
export function safeFileStem(name: string): string {
  const stem = name
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '') // accents dropped, letters kept: "Kühler" -> "Kuhler"
    .replace(/[^A-Za-z0-9._-]+/g, '-')
    .replace(/-{2,}/g, '-')
    .replace(/^[-.]+|[-.]+$/g, '')
    .slice(0, 80)
    .replace(/[-.]+$/g, '');
  return stem || 'coil';
}

interface Source {
  document: CoilDocument;
  coilName: string;
  projectId: string;
  /** "v3" or "draft", for file names. */
  label: string;
  versionNumber?: number;
  versionMessage?: string;
  versionId?: string;
}

export function exportService(deps: ServiceDeps) {
  const { db, logger } = deps;
  const coils = coilService(deps);

  /** The document to export after the read check (404 for another team's or an unknown id). */
  async function load(userId: string, target: ExportTarget): Promise<Source> {
    if (target.kind === 'coil') {
      const { coil } = await coilAccess(db, target.coilId, userId, 'read');
      return { document: coil.document, coilName: coil.name, projectId: coil.projectId, label: 'draft' };
    }
    const { version } = await versionAccess(db, target.versionId, userId, 'read');
    return {
      document: version.document,
      coilName: version.coilName,
      projectId: version.projectId,
      label: `v${version.number}`,
      versionNumber: version.number,
      versionMessage: version.message,
      versionId: version.id,
    };
  }

  const solve = (document: CoilDocument) => solveVersion(document, deps.solve, logger);
  const fileName = (source: Source, what: string, ext: string) => `${safeFileStem(source.coilName)}-${source.label}-${what}.${ext}`;

  async function metadata(userId: string, source: Source): Promise<ReportMetadata> {
    const [project, user, decisions] = await Promise.all([
      findProject(db, source.projectId),
      findUserById(db, userId),
      source.versionId ? latestDecisions(db, [source.versionId]) : Promise.resolve([]),
    ]);
    const decision = decisions[0];
    return {
      projectName: project?.project.name ?? '',
      client: project?.project.client || undefined,
      coilName: source.coilName,
      versionNumber: source.versionNumber,
      versionMessage: source.versionMessage,
      decision: decision && {
        status: DECISION_WORDS[decision.status] ?? decision.status,
        by: decision.decidedByName ?? 'a former member',
        at: decision.createdAt,
        note: decision.note || undefined,
      },
      preparedBy: user?.name ?? '',
      date: deps.now?.() ?? new Date(),
    };
  }

  return {
    async datasheetPdf(userId: string, target: ExportTarget, options: ReportOptions): Promise<ExportFile> {
      const source = await load(userId, target);
      const input = { document: source.document, result: solve(source.document), metadata: await metadata(userId, source), options };
      const body = await renderDatasheetPdf(input);
      return { body, contentType: 'application/pdf', fileName: fileName(source, `datasheet-${options.units}-${options.paper}`, 'pdf') };
    },

    async endFaceSvg(userId: string, target: ExportTarget, face: EndFace): Promise<ExportFile> {
      const source = await load(userId, target);
      const body = renderEndFaceSvg(source.document, solve(source.document), face);
      return { body, contentType: 'image/svg+xml; charset=utf-8', fileName: fileName(source, `end-face-${face}`, 'svg') };
    },

    async tubeSheetDxf(userId: string, target: ExportTarget): Promise<ExportFile> {
      const source = await load(userId, target);
      const body = renderTubeSheetDxf(source.document, solve(source.document));
      return { body, contentType: 'image/vnd.dxf; charset=utf-8', fileName: fileName(source, 'tube-sheet', 'dxf') };
    },

    async csv(userId: string, target: ExportTarget, table: CsvTable, units: UnitSystem): Promise<ExportFile> {
      const source = await load(userId, target);
      const body = CSV_WRITERS[table](source.document, solve(source.document), units);
      return { body, contentType: 'text/csv; charset=utf-8', fileName: fileName(source, `${table}-${units}`, 'csv') };
    },

    /** The coil document exactly as stored, pretty-printed so it diffs well; importable as it is. */
    async documentJson(userId: string, target: ExportTarget): Promise<ExportFile> {
      const source = await load(userId, target);
      const body = `${JSON.stringify(source.document, null, 2)}\n`;
      return { body, contentType: 'application/json; charset=utf-8', fileName: fileName(source, 'coil', 'json') };
    },

    /** Refuses viewers and reviewers (403) and other teams (404) before the body is looked at. */
    async assertCanImport(userId: string, projectId: string): Promise<void> {
      await projectAccess(db, projectId, userId, 'edit');
    },

    /** A validated document becomes a new coil at revision 1 (the name defaults to the document's). */
    async importCoil(userId: string, projectId: string, body: ImportCoilBody) {
      return coils.create(userId, projectId, { name: body.name, document: body.document });
    },
  };
}

export type ExportService = ReturnType<typeof exportService>;
