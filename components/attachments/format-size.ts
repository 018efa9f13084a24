/** File sizes as people read them in file lists: "840 B", "12.4 KB", "3.1 MB" (1 KB = 1024 bytes, like the 20 MB limit). */
export function formatFileSize(bytes: number): string {
  if (!Number.isFinite(bytes) || bytes < 0) return '—';
  if (bytes < 1024) return `${bytes} B`;
  const kb = bytes / 1024;
  if (kb < 1024) return `${kb < 10 ? kb.toFixed(1) : Math.round(kb)} KB`;
  const mb = kb / 1024;
  return `${mb < 10 ? mb.toFixed(1) : Math.round(mb)} MB`;
}

/** The upper-case extension for a file badge ("PDF", "CSV"), or "FILE". */
export function extensionLabel(fileName: string): string {
  const dot = fileName.lastIndexOf('.');
  const ext = dot > 0 ? fileName.slice(dot + 1) : '';
  return ext && ext.length <= 5 ? ext.toUpperCase() : 'FILE';
}
