/**
 * IBM Plex font files embedded in the PDF reports (SIL Open Font License, shipped by the
 * @expo-google-fonts packages). Resolved with createRequire, which works under tsx and vitest alike (STACK.md
 * pitfall 11).
 */
import { createRequire } from 'node:module';
import path from 'node:path';

const require = createRequire(import.meta.url);

function fontFile(family: 'ibm-plex-sans' | 'ibm-plex-mono', weight: string, file: string): string {
  const root = path.dirname(require.resolve(`@expo-google-fonts/${family}/package.json`));
  return path.join(root, weight, file);
}

/** Names the PDF registers its fonts under (svg-to-pdfkit maps SVG text onto the first two). */
export const REPORT_FONTS = {
  regular: { name: 'PlexSans', file: () => fontFile('ibm-plex-sans', '400Regular', 'IBMPlexSans_400Regular.ttf') },
  semibold: { name: 'PlexSans-SemiBold', file: () => fontFile('ibm-plex-sans', '600SemiBold', 'IBMPlexSans_600SemiBold.ttf') },
  italic: { name: 'PlexSans-Italic', file: () => fontFile('ibm-plex-sans', '400Regular_Italic', 'IBMPlexSans_400Regular_Italic.ttf') },
  mono: { name: 'PlexMono', file: () => fontFile('ibm-plex-mono', '400Regular', 'IBMPlexMono_400Regular.ttf') },
} as const;
