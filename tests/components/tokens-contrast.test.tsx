import { colors, contrastPairs } from '@/components/ui/tokens';
import { contrastRatio } from '@/lib/contrast';

describe('colour tokens', () => {
  it('computes the textbook ratio of black on white', () => {
    // WCAG 2.1 relative luminance: white 1.0, black 0.0 → (1.05 / 0.05) = 21:1
    expect(contrastRatio('#000000', '#ffffff')).toBeCloseTo(21, 5);
  });

  it.each(contrastPairs)('keeps %s on %s at or above %d:1', (fg, bg, min) => {
    // WCAG 2.1 SC 1.4.3 (text 4.5:1) and SC 1.4.11 (control borders 3:1)
    expect(contrastRatio(colors[fg], colors[bg])).toBeGreaterThanOrEqual(min);
  });
});
