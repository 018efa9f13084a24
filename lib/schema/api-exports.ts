/**
 * Contracts of the report and export downloads and of the coil import (DEVELOPERS.md, HTTP API): the query
 * parameters every download accepts, the kinds of file there are, and the import body. Shared by the server (parsing)
 * and the app (building links, sending the picked file).
 */
import { z } from 'zod';
import { coilDocumentSchema, endFaceSchema } from '@/lib/schema/coil-document';

export const exportUnitsSchema = z.enum(['si', 'ip'], { error: 'units must be "si" or "ip"' });
export const paperSchema = z.enum(['A4', 'Letter'], { error: 'paper must be "A4" or "Letter"' });

/** ?units= for the CSV files (default SI). */
export const unitsQuerySchema = z.object({ units: exportUnitsSchema.default('si') });
export type UnitsQuery = z.infer<typeof unitsQuerySchema>;

/** ?units=&paper= for the data sheet (defaults SI, A4). */
export const datasheetQuerySchema = z.object({ units: exportUnitsSchema.default('si'), paper: paperSchema.default('A4') });
export type DatasheetQuery = z.infer<typeof datasheetQuerySchema>;

/** ?face= for the end-face drawing (default the connection end). */
export const endFaceQuerySchema = z.object({
  face: endFaceSchema.default('connection'),
});
export type EndFaceQuery = z.infer<typeof endFaceQuerySchema>;

/** Every file a coil or a version can be downloaded as; the value is the last segment of its URL. */
export const EXPORT_FILES = {
  datasheet: 'datasheet.pdf',
  endFace: 'end-face.svg',
  tubeSheet: 'tube-sheet.dxf',
  circuits: 'circuits.csv',
  tubes: 'tubes.csv',
  billOfMaterials: 'bill-of-materials.csv',
  document: 'document.json',
} as const;
export type ExportFile = keyof typeof EXPORT_FILES;

const coilName = z.string().trim().min(1, 'Give the coil a name.').max(120, 'Keep the name under 120 characters.');

/** True when the body is `{ name?, document }` rather than a coil document itself. */
function isWrapped(body: unknown): boolean {
  return typeof body === 'object' && body !== null && !Array.isArray(body) && 'document' in body && !('schemaVersion' in body);
}

/**
 * POST /api/projects/:projectId/coils/import accepts the coil document itself (a document.json export as it is) or
 * `{ name?, document }`; either way problems are reported under `document.<path>`.
 */
export const importCoilBodySchema = z.preprocess(
  (body) => (isWrapped(body) ? body : { document: body }),
  z.object({ name: coilName.optional(), document: coilDocumentSchema }),
);
export type ImportCoilBody = z.infer<typeof importCoilBodySchema>;
