// @vitest-environment node
import { describe, expect, it } from 'vitest';
import { THEMES, type ColorRole } from '../../../tailwind.config';

/*
 * Relative luminance and contrast ratio as defined in W3C (2018), "Web Content Accessibility Guidelines (WCAG) 2.1",
 * glossary entries "relative luminance" and "contrast ratio"; thresholds from success criteria 1.4.3 (text, 4.5:1)
 * and 1.4.11 (edges of controls and focus indicators, 3:1).
 */
const channel = (c: number) => (c <= 0.03928 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4);
function luminance(hex: string): number {
  const [r, g, b] = [1, 3, 5].map((i) => channel(parseInt(hex.slice(i, i + 2), 16) / 255)) as [
    number,
    number,
    number,
  ];
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}
function contrast(a: string, b: string): number {
  const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x) as [number, number];
  return (hi + 0.05) / (lo + 0.05);
}

const TEXT_ON: [ColorRole[], ColorRole[]][] = [
  [
    ['ink', 'ink-soft', 'ink-muted', 'link'],
    ['canvas', 'surface', 'tint', 'tint-strong'],
  ],
  [['ok'], ['canvas', 'surface', 'tint', 'ok-soft']],
  [['watch'], ['canvas', 'surface', 'tint', 'watch-soft']],
  [['danger'], ['canvas', 'surface', 'tint', 'danger-soft']],
  [['on-accent'], ['accent', 'accent-hover']],
  [
    ['on-chrome', 'on-chrome-muted'],
    ['chrome', 'chrome-active'],
  ],
  [['on-danger'], ['danger-solid']],
];
const EDGES_ON: [ColorRole[], ColorRole[]][] = [
  [
    ['line-strong', 'focus', 'accent'],
    ['canvas', 'surface', 'tint'],
  ],
];

const pairs = (groups: [ColorRole[], ColorRole[]][]) =>
  groups.flatMap(([fgs, bgs]) => fgs.flatMap((fg) => bgs.map((bg) => [fg, bg] as const)));

describe('design tokens', () => {
  it('when the formula is given black on white, then it gives 21:1 (the definition), and #767676 on white about 4.54:1 (from memory)', () => {
    expect(contrast('#000000', '#ffffff')).toBeCloseTo(21, 5);
    expect(contrast('#767676', '#ffffff')).toBeCloseTo(4.54, 2);
  });

  for (const scheme of ['light', 'dark'] as const) {
    it(`when text is drawn on its backgrounds in the ${scheme} scheme, then every pair reaches 4.5:1`, () => {
      const theme = THEMES[scheme];
      const weak = pairs(TEXT_ON)
        .filter(([fg, bg]) => contrast(theme[fg], theme[bg]) < 4.5)
        .map(([fg, bg]) => `${fg} on ${bg}: ${contrast(theme[fg], theme[bg]).toFixed(2)}`);
      expect(weak).toEqual([]);
    });

    it(`when control edges and the focus ring sit on the page in the ${scheme} scheme, then they reach 3:1`, () => {
      const theme = THEMES[scheme];
      const weak = pairs(EDGES_ON)
        .filter(([fg, bg]) => contrast(theme[fg], theme[bg]) < 3)
        .map(([fg, bg]) => `${fg} on ${bg}: ${contrast(theme[fg], theme[bg]).toFixed(2)}`);
      expect(weak).toEqual([]);
    });
  }

  it('when a role is named in one scheme, then the other scheme has it too', () => {
    expect(Object.keys(THEMES.dark).sort()).toEqual(Object.keys(THEMES.light).sort());
  });
});
