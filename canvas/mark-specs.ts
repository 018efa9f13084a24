/**
 * The SVG elements of each mark of the sheet's changing layers, as data (canvas/dom-marks.ts builds them on the
 * web): the same elements, attributes and test ids sheet-marks.tsx draws through react-native-svg.
 */
import { fonts } from '@/components/ui/theme';
import type { MarkSpec } from './dom-marks';
import { bendDash, bendTestId } from './mark-equality';
import { sheetColours } from './palette';
import type { BendMark, StubMark, TubeLook } from './render-model';

const font = (family: string, size: number) => `font-family: ${family}; font-size: ${size}px;`;

export function tubeSpec(look: TubeLook, r: number): MarkSpec {
  return {
    tag: 'g',
    attrs: { opacity: look.dim ? 0.35 : 1 },
    children: [
      {
        tag: 'circle',
        attrs: {
          cx: look.x,
          cy: look.y,
          r,
          fill: look.fill,
          stroke: look.stroke,
          'stroke-width': look.strokeWidth,
          'stroke-dasharray': look.dashed ? `${r * 0.35} ${r * 0.25}` : undefined,
          'data-testid': `tube-${look.key}`,
        },
      },
      look.label
        ? {
            tag: 'text',
            attrs: { x: look.x, y: look.y + r * 0.32, 'text-anchor': 'middle', fill: look.labelColour, 'pointer-events': 'none', style: font(fonts.monoMedium, r * 0.9) },
            text: look.label,
          }
        : null,
    ],
  };
}

export function bendSpec(bend: BendMark, r: number): MarkSpec {
  const width = bend.faint ? r * 0.35 : r * 0.8;
  const id = bendTestId(bend);
  const line = (d: string, stroke: string, w: number, extra: MarkSpec['attrs'] = {}): MarkSpec => ({
    tag: 'path',
    attrs: { d, stroke, 'stroke-width': w, 'stroke-linecap': 'round', fill: 'none', ...extra },
  });
  return {
    tag: 'g',
    attrs: { opacity: bend.faint ? 0.35 : 1, 'pointer-events': 'none', 'data-testid': `bend-${bend.end}-${id}` },
    children: [
      bend.selected ? line(bend.d, sheetColours.selection, width + r * 0.7, { opacity: 0.45 }) : null,
      line(bend.d, bend.colour, width, { 'stroke-dasharray': bendDash(bend, r) }),
      bend.bridge
        ? {
            tag: 'g',
            attrs: { 'data-testid': `crossover-${bend.end}-${id}` },
            children: [line(bend.bridge, '#FFFFFF', r * 0.55), line(bend.bridge, bend.faint ? bend.colour : '#0E2A33', r * 0.25)],
          }
        : null,
      bend.arrow && !bend.faint ? { tag: 'path', attrs: { d: bend.arrow, fill: '#0E2A33' } } : null,
    ],
  };
}

export function stubSpec(stub: StubMark, r: number): MarkSpec {
  return {
    tag: 'g',
    attrs: { opacity: stub.faint ? 0.35 : 1, 'pointer-events': 'none', 'data-testid': `stub-${stub.kind}-${stub.key.split(':')[2]}` },
    children: [
      { tag: 'path', attrs: { d: stub.d, stroke: stub.colour, 'stroke-width': r * 0.45, 'stroke-linecap': 'round', fill: 'none' } },
      { tag: 'path', attrs: { d: stub.head, fill: '#0E2A33' } },
      { tag: 'text', attrs: { x: stub.labelX, y: stub.labelY, fill: '#0E2A33', style: font(fonts.monoMedium, r * 0.85) }, text: stub.kind === 'supply' ? 'S' : 'R' },
    ],
  };
}
