/** Rename the coil inside its document. */
import type { CoilDocument } from '@/lib/engine/types';

export function renameCoil(doc: CoilDocument, name: string): void {
  doc.name = name;
}
