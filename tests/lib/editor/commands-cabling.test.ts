import { plannedCable, suggestMedia } from '@/lib/editor/commands';
import { analyze } from '@/shared/analysis/analyze';
import { apply, port, refusal, smallDesign } from '@/tests/lib/editor/helpers/editor';

describe('cabling two ports', () => {
  it('numbers cables and labels them with our own readable scheme', () => {
    let doc = apply(smallDesign(), 'cablePorts', { a: 'host-1-card-1-p1', b: 'switch-1-p1', lengthM: 5 });
    expect(plannedCable(doc)).toEqual({ id: 'cable-2', label: 'C002' });
    doc = apply(doc, 'cablePorts', { a: 'host-1-card-2-p1', b: 'switch-2-p1', media: 'cat6', label: 'HR-B-01' });
    expect(doc.cables).toEqual([
      { id: 'cable-1', label: 'C001', a: 'host-1-card-1-p1', b: 'switch-1-p1', media: 'cat6a', lengthM: 5 },
      { id: 'cable-2', label: 'HR-B-01', a: 'host-1-card-2-p1', b: 'switch-2-p1', media: 'cat6' },
    ]);
  });

  it('numbers above every cable left in the document, and above a floor when one is given', () => {
    let doc = apply(smallDesign(), 'cablePorts', { a: 'host-1-card-1-p1', b: 'switch-1-p1' });
    doc = apply(doc, 'cablePorts', { a: 'host-2-card-1-p1', b: 'switch-1-p2' });
    doc = apply(doc, 'cablePorts', { a: 'host-2-card-2-p1', b: 'switch-1-p3' });
    doc = apply(doc, 'uncable', { ids: ['cable-2', 'cable-3'] });
    const fromDoc = apply(doc, 'cablePorts', { a: 'host-2-card-1-p1', b: 'switch-1-p4' });
    expect(fromDoc.cables.map((c) => `${c.id}/${c.label}`)).toEqual(['cable-1/C001', 'cable-2/C002']);
    // The store passes the highest number it has handed out, so C003 is not given to another cable.
    const withFloor = apply(doc, 'cablePorts', { a: 'host-2-card-1-p1', b: 'switch-1-p4', numberFloor: 4 });
    expect(withFloor.cables.map((c) => `${c.id}/${c.label}`)).toEqual(['cable-1/C001', 'cable-4/C004']);
  });

  it('refuses to cable a port to itself', () => {
    const error = refusal(() => apply(smallDesign(), 'cablePorts', { a: 'switch-1-p1', b: 'switch-1-p1' }));
    expect([error.code, error.path]).toEqual(['refused', 'b']);
  });

  it('refuses an unknown port with the end at fault', () => {
    expect(refusal(() => apply(smallDesign(), 'cablePorts', { a: 'switch-1-p1', b: 'switch-1-p99' })).path).toBe('b');
  });

  it('refuses a second cable between the same two ports, either way round', () => {
    const doc = apply(smallDesign(), 'cablePorts', { a: 'host-1-card-1-p1', b: 'switch-1-p1' });
    expect(refusal(() => apply(doc, 'cablePorts', { a: 'switch-1-p1', b: 'host-1-card-1-p1' })).message).toMatch(/already joined by C001/);
  });

  it('lets a draft cable a port twice and leaves the finding to the analysis', () => {
    let doc = apply(smallDesign(), 'cablePorts', { a: 'host-1-card-1-p1', b: 'switch-1-p1' });
    doc = apply(doc, 'cablePorts', { a: 'host-1-card-1-p1', b: 'switch-2-p1' });
    expect(doc.cables).toHaveLength(2);
    const finding = analyze(doc).findings.find((f) => f.rule === 'port-double-cabled');
    expect(finding?.subjects).toContain('host-1-card-1-p1');
  });

  it('re-patches with replace: the cables already on either port go first', () => {
    let doc = apply(smallDesign(), 'cablePorts', { a: 'host-1-card-1-p1', b: 'switch-1-p1' });
    doc = apply(doc, 'cablePorts', { a: 'host-2-card-1-p1', b: 'switch-1-p2' });
    doc = apply(doc, 'cablePorts', { a: 'host-1-card-1-p1', b: 'switch-1-p2', replace: true });
    expect(doc.cables.map((c) => [c.id, c.a, c.b])).toEqual([['cable-3', 'host-1-card-1-p1', 'switch-1-p2']]);
  });

  it('suggests media from the connectors, speed and length', () => {
    const doc = apply(smallDesign(), 'setPort', { id: 'switch-1-p1', connector: 'sfp' });
    const sfp = { ...port(doc, 'switch-1-p1') };
    const sfp25 = { ...sfp, speedGbps: 25 as const };
    // Category 6A: 10GBASE-T over a 100 m channel, IEEE 802.3an.
    expect(suggestMedia(port(doc, 'switch-1-p2'), port(doc, 'host-1-card-1-p1'))).toBe('cat6a');
    // Passive SFP+ direct attach reaches 7 m at 10G (SFF-8431 appendix E; limit by common practice).
    expect(suggestMedia(sfp, sfp, 5)).toBe('dac');
    // 25GBASE-CR reaches 5 m (IEEE 802.3by clause 110, from memory), so 6 m needs fibre: OM4 100 m at 25GBASE-SR (IEEE 802.3by clause 112).
    expect(suggestMedia(sfp25, sfp25, 6)).toBe('om4');
    // Beyond OM4's 400 m at 10GBASE-SR (IEEE 802.3ae) only the active optical cable is left to suggest.
    expect(suggestMedia(sfp, sfp, 401)).toBe('om4');
  });
});

describe('uncabling and editing cables', () => {
  it('removes the cables of one port', () => {
    let doc = apply(smallDesign(), 'cablePorts', { a: 'host-1-card-1-p1', b: 'switch-1-p1' });
    doc = apply(doc, 'cablePorts', { a: 'host-2-card-1-p1', b: 'switch-1-p2' });
    expect(apply(doc, 'uncablePort', { portId: 'switch-1-p1' }).cables.map((c) => c.id)).toEqual(['cable-2']);
  });

  it('sets media, length and label, and null removes length and label', () => {
    let doc = apply(smallDesign(), 'cablePorts', { a: 'host-1-card-1-p1', b: 'switch-1-p1' });
    doc = apply(doc, 'setCable', { id: 'cable-1', media: 'cat6', lengthM: 12.5, label: ' HR-A-07 ' });
    expect(doc.cables[0]).toEqual({ id: 'cable-1', label: 'HR-A-07', a: 'host-1-card-1-p1', b: 'switch-1-p1', media: 'cat6', lengthM: 12.5 });
    doc = apply(doc, 'setCable', { id: 'cable-1', lengthM: null, label: null });
    expect(doc.cables[0]).toEqual({ id: 'cable-1', a: 'host-1-card-1-p1', b: 'switch-1-p1', media: 'cat6' });
  });

  it('refuses a length that is not positive', () => {
    const doc = apply(smallDesign(), 'cablePorts', { a: 'host-1-card-1-p1', b: 'switch-1-p1' });
    expect(refusal(() => apply(doc, 'setCable', { id: 'cable-1', lengthM: 0 })).path).toBe('args.lengthM');
  });
});
