/**
 * Downloads of a coil's working draft (/api/coils/:coilId/...) or of a saved version (/api/versions/:versionId/...):
 * datasheet.pdf, end-face.svg, tube-sheet.dxf, circuits.csv, tubes.csv, bill-of-materials.csv and document.json;
 * and POST /api/projects/:projectId/coils/import (DEVELOPERS.md, HTTP API).
 */
import type { Request, Response } from 'express';
import { Router } from 'express';
import type { ZodError } from 'zod';
import {
  datasheetQuerySchema,
  endFaceQuerySchema,
  EXPORT_FILES,
  importCoilBodySchema,
  unitsQuerySchema,
} from '@/lib/schema/api-exports';
import { AppError } from '@/server/errors';
import { signedIn } from '@/server/middleware/session';
import { param } from '@/server/routes/helpers';
import type { ServiceDeps } from '@/server/services/context';
import { exportService, type CsvTable, type ExportFile, type ExportTarget } from '@/server/services/exports';

function send(res: Response, file: ExportFile): void {
  res.setHeader('Content-Type', file.contentType);
  // Built from our own safe ASCII stem, so no quoting or encoding issues reach the header.
  res.setHeader('Content-Disposition', `attachment; filename="${file.fileName}"`);
  // Reports depend on who asks and when (decisions, prepared by); never cache them in shared caches.
  res.setHeader('Cache-Control', 'private, no-store');
  res.send(file.body);
}

/** Every problem with its path, several messages for one path joined, so a file can be fixed in one go. */
function everyProblem(error: ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.map(String).join('.') || 'document';
    fields[key] = fields[key] ? `${fields[key]}; ${issue.message}` : issue.message;
  }
  return fields;
}

const CSV_TABLES: Record<string, CsvTable> = {
  [EXPORT_FILES.circuits]: 'circuits',
  [EXPORT_FILES.tubes]: 'tubes',
  [EXPORT_FILES.billOfMaterials]: 'bill-of-materials',
};

export function exportRouter(deps: ServiceDeps): Router {
  const exports = exportService(deps);
  const r = Router();

  const targets: { prefix: string; target: (req: Request) => ExportTarget }[] = [
    { prefix: '/coils/:coilId', target: (req) => ({ kind: 'coil', coilId: param(req, 'coilId') }) },
    { prefix: '/versions/:versionId', target: (req) => ({ kind: 'version', versionId: param(req, 'versionId') }) },
  ];

  for (const { prefix, target } of targets) {
    r.get(`${prefix}/${EXPORT_FILES.datasheet}`, async (req, res) => {
      const options = datasheetQuerySchema.parse(req.query);
      send(res, await exports.datasheetPdf(signedIn(req).userId, target(req), options));
    });
    r.get(`${prefix}/${EXPORT_FILES.endFace}`, async (req, res) => {
      const { face } = endFaceQuerySchema.parse(req.query);
      send(res, await exports.endFaceSvg(signedIn(req).userId, target(req), face));
    });
    r.get(`${prefix}/${EXPORT_FILES.tubeSheet}`, async (req, res) => {
      send(res, await exports.tubeSheetDxf(signedIn(req).userId, target(req)));
    });
    for (const [file, table] of Object.entries(CSV_TABLES)) {
      r.get(`${prefix}/${file}`, async (req, res) => {
        const { units } = unitsQuerySchema.parse(req.query);
        send(res, await exports.csv(signedIn(req).userId, target(req), table, units));
      });
    }
    r.get(`${prefix}/${EXPORT_FILES.document}`, async (req, res) => {
      send(res, await exports.documentJson(signedIn(req).userId, target(req)));
    });
  }

  r.post('/projects/:projectId/coils/import', async (req, res) => {
    const { userId } = signedIn(req);
    const projectId = param(req, 'projectId');
    await exports.assertCanImport(userId, projectId);
    const parsed = importCoilBodySchema.safeParse(req.body);
    if (!parsed.success) {
      const fields = everyProblem(parsed.error);
      const count = Object.keys(fields).length;
      throw new AppError(
        400,
        'invalid_document',
        `This file is not a Tubeloom coil document we can import: ${count} ${count === 1 ? 'problem' : 'problems'} found. Nothing was created.`,
        fields,
      );
    }
    res.status(201).json({ coil: await exports.importCoil(userId, projectId, parsed.data) });
  });

  return r;
}
