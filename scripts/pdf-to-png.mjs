#!/usr/bin/env node
// Render PDF pages to PNG for looking at a generated report (pdfjs-dist + its optional @napi-rs/canvas).
// Usage: node scripts/pdf-to-png.mjs <file.pdf> [outPrefix] [--page N] [--scale S]
//   writes <outPrefix>-p<N>.png for every page (or only page N); outPrefix defaults to the PDF path without .pdf.
import { readFile, writeFile } from 'node:fs/promises';
import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';

const args = process.argv.slice(2);
const flag = (name) => {
  const i = args.indexOf(name);
  if (i < 0) return undefined;
  const value = args[i + 1];
  args.splice(i, 2);
  return value;
};
const onlyPage = flag('--page');
const scale = Number(flag('--scale') ?? 1.5);
const [input, prefixArg] = args;
if (!input) {
  console.error('usage: node scripts/pdf-to-png.mjs <file.pdf> [outPrefix] [--page N] [--scale S]');
  process.exit(2);
}
const prefix = prefixArg ?? input.replace(/\.pdf$/i, '');

const data = new Uint8Array(await readFile(input));
const pdf = await getDocument({ data, verbosity: 0 }).promise;
const pages = onlyPage ? [Number(onlyPage)] : Array.from({ length: pdf.numPages }, (_, i) => i + 1);
for (const n of pages) {
  const page = await pdf.getPage(n);
  const viewport = page.getViewport({ scale });
  const entry = pdf.canvasFactory.create(Math.ceil(viewport.width), Math.ceil(viewport.height));
  // White background: the PDF page itself is transparent.
  entry.context.fillStyle = '#ffffff';
  entry.context.fillRect(0, 0, entry.canvas.width, entry.canvas.height);
  await page.render({ canvasContext: entry.context, canvas: entry.canvas, viewport }).promise;
  const out = `${prefix}-p${n}.png`;
  await writeFile(out, entry.canvas.toBuffer('image/png'));
  console.log(out);
}
await pdf.destroy();
