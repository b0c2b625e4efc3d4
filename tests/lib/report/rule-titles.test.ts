import { RULES } from '@/shared/analysis/rules';
import { RULE_TITLES, ruleTitle } from '@/lib/report/rule-titles';

describe('finding titles', () => {
  it('gives every rule of the catalogue a title in words, each its own and none the bare id', () => {
    const rules = Object.keys(RULES);
    expect(Object.keys(RULE_TITLES).sort()).toEqual(rules.sort());
    const titles = Object.values(RULE_TITLES);
    expect(new Set(titles).size).toBe(titles.length);
    for (const [rule, title] of Object.entries(RULE_TITLES)) {
      expect(title).not.toBe(rule);
      expect(title).toMatch(/^[A-Z]/);
    }
  });

  it('falls back to the id for a rule it does not know', () => {
    expect(ruleTitle('chap-off')).toBe('CHAP is off');
    expect(ruleTitle('rule-from-a-newer-server')).toBe('rule-from-a-newer-server');
    expect(ruleTitle('constructor')).toBe('constructor'); // an id, never a key of a plain object
  });
});
