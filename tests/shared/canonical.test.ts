import { canonicalJson, sameDocument } from '@/shared/topology/canonical';
import v1 from '@/shared/fixtures/harbor-road-v1.json';
import v2 from '@/shared/fixtures/harbor-road-v2.json';

function reversedKeys(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(reversedKeys);
  if (value === null || typeof value !== 'object') return value;
  return Object.fromEntries(Object.entries(value).reverse().map(([k, v]) => [k, reversedKeys(v)]));
}

describe('canonical JSON of a document', () => {
  it('gives the same text whatever the order of keys, and keeps array order', () => {
    expect(canonicalJson(reversedKeys(v1))).toBe(canonicalJson(v1));
    expect(canonicalJson({ b: 1, a: [3, 1, { d: 1, c: 2 }] })).toBe('{"a":[3,1,{"c":2,"d":1}],"b":1}');
    expect(canonicalJson([1, 2])).not.toBe(canonicalJson([2, 1]));
  });

  it('drops undefined members as JSON does', () => {
    expect(canonicalJson({ a: 1, b: undefined })).toBe('{"a":1}');
  });

  it('tells two versions of the demo apart and a reordered copy not', () => {
    expect(sameDocument(v1, reversedKeys(v1))).toBe(true);
    expect(sameDocument(v1, v2)).toBe(false);
  });
});
