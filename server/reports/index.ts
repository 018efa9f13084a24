/** Report and export generators (pure: document + result in, bytes or text out). The HTTP routes call these. */
export { renderDatasheetPdf } from '@/server/reports/datasheet-pdf';
export type { DatasheetInput, ReportMetadata, ReportOptions, ReportDecision } from '@/server/reports/report-input';
export { renderEndFaceSvg, type EndFaceSvgOptions } from '@/server/reports/end-face-svg';
export { renderTubeSheetDxf, DXF_LAYERS } from '@/server/reports/dxf';
export { circuitsCsv, tubesCsv, billOfMaterialsCsv } from '@/server/reports/csv';
