/** How large a read-only sheet is drawn, in screen pixels per sheet millimetre. */

/** The editor's zoom 1. */
export const BASE_PX_PER_MM = 1.25;
export const MAX_PX_PER_MM = 2;
/** A sheet is enlarged beyond the base scale only while it stays under this height (px). */
const COMFORTABLE_HEIGHT_PX = 800;

/**
 * Always fits the available width (no sideways scrolling on phones); otherwise the base scale, enlarged up to
 * MAX_PX_PER_MM for short sheets that stay under a comfortable height.
 */
export function sheetScale(available_px: number, sheetWidth_mm: number, sheetHeight_mm: number): number {
  if (available_px <= 0 || sheetWidth_mm <= 0 || sheetHeight_mm <= 0) return 0;
  const preferred = Math.max(BASE_PX_PER_MM, Math.min(MAX_PX_PER_MM, COMFORTABLE_HEIGHT_PX / sheetHeight_mm));
  return Math.min(available_px / sheetWidth_mm, preferred);
}
