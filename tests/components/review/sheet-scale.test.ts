import { describe, expect, it } from 'vitest';
import { BASE_PX_PER_MM, MAX_PX_PER_MM, sheetScale } from '@/components/review/sheet-scale';

describe('sheetScale', () => {
  it('shrinks a sheet to the available width so a phone never scrolls sideways', () => {
    expect(sheetScale(300, 400, 200) * 400).toBeCloseTo(300, 6);
  });

  it('keeps a tall sheet at the base scale when there is room', () => {
    expect(sheetScale(1000, 140, 900)).toBe(BASE_PX_PER_MM);
  });

  it('enlarges a short sheet, up to the largest scale', () => {
    expect(sheetScale(1000, 140, 200)).toBe(MAX_PX_PER_MM);
    expect(sheetScale(1000, 140, 500)).toBeCloseTo(800 / 500, 6);
  });

  it('draws nothing before the width is known', () => {
    expect(sheetScale(0, 140, 500)).toBe(0);
  });
});
