import { PATTERN_IDS } from '@/lib/editor/commands';
import { PATTERNS } from '@/shared/patterns';

describe('pattern names', () => {
  it('gives each pattern one name: the list, a built design and the editor’s pattern ids agree', () => {
    expect(PATTERNS.map((p) => p.id)).toEqual([...PATTERN_IDS]);
    for (const pattern of PATTERNS) expect(pattern.build({}).name).toBe(pattern.name);
    expect(new Set(PATTERNS.map((p) => p.name)).size).toBe(PATTERNS.length);
  });

});
