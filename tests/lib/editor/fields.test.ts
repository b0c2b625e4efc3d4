import { checkIscsiName } from '@/shared/rules/iqn';
import { cidrField, iqnAdvice, iqnField, ipField, lengthField, mtuField, nameField, parseField, ruField, versionMessageField, vlanField } from '@/lib/editor/fields';

const ok = <T,>(result: { ok: true; value: T } | { ok: false; message: string }) => (result.ok ? result.value : `refused: ${result.message}`);

describe('inspector fields', () => {
  it('accepts the RFC’s own initiator names and folds nothing away', () => {
    // RFC 7143 §4.2.7.4 examples.
    expect(ok(parseField(iqnField, ' iqn.2001-04.com.example:storage:diskarrays-sn-a8675309 '))).toBe('iqn.2001-04.com.example:storage:diskarrays-sn-a8675309');
    // RFC 7143 §4.2.7.5 example.
    expect(ok(parseField(iqnField, 'eui.02004567A425678D'))).toBe('eui.02004567A425678D');
    // An empty field removes the name.
    expect(ok(parseField(iqnField, '  '))).toBeNull();
  });

  it('keeps a bad initiator name for the analysis to report, and explains it as it is typed', () => {
    // RFC 7143 §4.2.7.4: the month is 01–12; a draft may hold a wrong one, reported as iqn-invalid.
    expect(ok(parseField(iqnField, 'iqn.2001-13.com.example'))).toBe('iqn.2001-13.com.example');
    // RFC 7143 §4.2.7.2: "_" and spaces are not allowed; the advice is the shared rule's reason, word for word.
    const check = checkIscsiName('iqn.2001-04.com.ex_ample:a b');
    expect(check.ok).toBe(false);
    expect(ok(parseField(iqnField, 'iqn.2001-04.com.ex_ample:a b'))).toBe('iqn.2001-04.com.ex_ample:a b');
    expect(iqnAdvice('iqn.2001-04.com.ex_ample:a b')).toBe(`Not a valid iSCSI name: ${check.ok ? '' : check.reason}.`);
    expect(iqnAdvice('iqn.2001-04.com.example')).toBeNull(); // RFC 7143 §4.2.7.4 example
    expect(iqnAdvice('')).toBeNull();
    // The document's own limit still refuses a name no iSCSI name could be (RFC 7143 §4.2.7.1: 223 bytes).
    expect(ok(parseField(iqnField, 'x'.repeat(1001)))).toMatch(/^refused: /);
  });

  it('keeps a VLAN or MTU out of range for the analysis to report, but refuses text that is not a number', () => {
    // IEEE 802.1Q: 1–4094; 5000 is a finding, not a typing error.
    expect([ok(parseField(vlanField, '5000')), ok(parseField(vlanField, '')), ok(parseField(vlanField, 'ten'))]).toEqual([5000, null, 'refused: Enter the VLAN ID as a whole number.']);
    // Jumbo 9000 is common practice.
    expect([ok(parseField(mtuField, '9000')), ok(parseField(mtuField, '9000.5'))]).toEqual([9000, 'refused: Enter the MTU in bytes as a whole number.']);
  });

  it('checks blocks and addresses with the shared address rules', () => {
    // RFC 5737 documentation ranges.
    expect(ok(parseField(cidrField, '198.51.100.0/24'))).toBe('198.51.100.0/24');
    expect(String(ok(parseField(cidrField, '198.51.100.0')))).toMatch(/^refused: Enter a block with its prefix length/);
    expect([ok(parseField(ipField, '203.0.113.9')), ok(parseField(ipField, '2001:db8::1')), ok(parseField(ipField, ''))]).toEqual(['203.0.113.9', '2001:db8::1', null]);
    expect(String(ok(parseField(ipField, '203.0.113.9/24')))).toMatch(/^refused:/);
  });

  it('reads lengths, rack units, names and version messages', () => {
    expect([ok(parseField(lengthField, '2.5')), ok(parseField(lengthField, '')), ok(parseField(lengthField, '0'))]).toEqual([2.5, null, 'refused: A cable is longer than 0 m and at most 100 km.']);
    expect([ok(parseField(ruField, '42')), ok(parseField(ruField, '0'))]).toEqual([42, 'refused: Use a number from 1 to 100.']);
    expect([ok(parseField(nameField, ' fab-a ')), ok(parseField(nameField, ' '))]).toEqual(['fab-a', 'refused: Give it a name.']);
    expect(ok(parseField(versionMessageField, ''))).toBe('refused: Say what changed in this version.');
  });
});
