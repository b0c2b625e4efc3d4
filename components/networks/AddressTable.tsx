import { memo, useMemo, useState } from 'react';
import { StyleSheet, TextInput, View } from 'react-native';
import { useStore } from 'zustand';
import { Button, Card, Icon, Text, TextField, colors, radius, space, TAP_TARGET, type as typeScale } from '@/components/ui';
import type { Topology } from '@/shared/topology/schema';
import { addressRows, PROBLEM_WORDS, type AddressFilter, type AddressRow } from '@/lib/editor/address-rows';
import { ipField, parseField } from '@/lib/editor/fields';
import { liveAnalysisStore } from '@/lib/editor/live-analysis';
import { ChipPicker } from '@/components/inspector/ChipPicker';
import { runEdit } from '@/components/inspector/run';

const PAGE = 60;

type AddressInputProps = { row: AddressRow; readOnly: boolean; error: string | null; setError: (error: string | null) => void };

/** The address as typed; its error lives in the row, so the row's status never says OK beside it. */
function AddressInput({ row, readOnly, error, setError }: AddressInputProps) {
  const [draft, setDraft] = useState<string | null>(null);
  const shown = draft ?? (row.address === 'DHCP' ? '' : row.address);
  const commit = () => {
    if (draft === null) return;
    const parsed = parseField(ipField, draft);
    if (!parsed.ok) return setError(parsed.message);
    const refusal = runEdit('setPort', { id: row.portId, address: parsed.value === null ? null : { mode: 'static', ip: parsed.value } });
    setError(refusal);
    if (!refusal) setDraft(null);
  };
  return (
    <View style={styles.inputWrap}>
      <TextInput
        value={shown}
        editable={!readOnly}
        placeholder={row.address === 'DHCP' ? 'DHCP' : 'none'}
        placeholderTextColor={colors.inkMuted}
        aria-label={`Address of ${row.device} ${row.port}`}
        testID={`address-ip-${row.portId}`}
        autoCapitalize="none"
        autoCorrect={false}
        style={[styles.input, error ? styles.inputInvalid : null]}
        onChangeText={(text) => {
          setDraft(text);
          const parsed = parseField(ipField, text);
          setError(parsed.ok ? null : parsed.message);
        }}
        onBlur={commit}
        onSubmitEditing={commit}
      />
      {error ? (
        <Text variant="caption" color="dangerText" role="alert">
          {error}
        </Text>
      ) : null}
    </View>
  );
}

const Row = memo(function Row({ row, doc, readOnly, wide }: { row: AddressRow; doc: Topology; readOnly: boolean; wide: boolean }) {
  const [typingError, setTypingError] = useState<string | null>(null);
  const chips = [{ value: '', label: 'None' }, ...doc.networks.map((n) => ({ value: n.id, label: n.name || n.id }))];
  return (
    <View style={[styles.row, wide && styles.rowWide]} testID={`address-row-${row.portId}`}>
      <View style={wide ? styles.colName : undefined}>
        <Text variant="smallStrong">{row.device}</Text>
        <Text variant="small" color="inkMuted">{`${row.port} · ${row.role === 'data' ? 'data' : 'management'}`}</Text>
      </View>
      <View style={wide ? styles.colNetwork : undefined}>
        <ChipPicker label={`Network of ${row.device} ${row.port}`} hideLabel={wide} chips={chips} value={row.networkId ?? ''} disabled={readOnly} testID={`address-network-${row.portId}`} onChange={(id) => runEdit('setPort', { id: row.portId, networkId: id === '' ? null : id })} />
      </View>
      <View style={wide ? styles.colAddress : undefined}>
        <AddressInput key={row.address} row={row} readOnly={readOnly} error={typingError} setError={setTypingError} />
      </View>
      <View style={[styles.colStatus]} testID={`address-status-${row.portId}`}>
        {typingError ? (
          <View style={styles.status}>
            <Icon name="error" size={18} color="dangerText" />
            <Text variant="small" color="dangerText" style={styles.statusText}>
              Not saved: fix the address first
            </Text>
          </View>
        ) : row.problems.length === 0 ? (
          <View style={styles.status}>
            <Icon name={row.address ? 'success' : 'info'} size={18} color={row.address ? 'successText' : 'inkMuted'} />
            <Text variant="small" color={row.address ? 'successText' : 'inkMuted'}>
              {row.address ? 'OK' : 'Not cabled, no address needed yet'}
            </Text>
          </View>
        ) : (
          row.problems.map((f, i) => (
            <View key={i} style={styles.status}>
              <Icon name={f.severity === 'error' ? 'error' : 'warning'} size={18} color={f.severity === 'error' ? 'dangerText' : 'warningText'} />
              <Text variant="small" color={f.severity === 'error' ? 'dangerText' : 'warningText'} style={styles.statusText}>
                <Text variant="smallStrong" color={f.severity === 'error' ? 'dangerText' : 'warningText'}>{`${PROBLEM_WORDS.get(f.rule) ?? f.rule}: `}</Text>
                {f.message}
              </Text>
            </View>
          ))
        )}
      </View>
    </View>
  );
});

/** Every host and controller port with its network, address and the analysis's verdict. */
export function AddressTable({ doc, readOnly, wide }: { doc: Topology; readOnly: boolean; wide: boolean }) {
  const marks = useStore(liveAnalysisStore, (s) => s.marks);
  const [filter, setFilter] = useState<AddressFilter>('all');
  const [query, setQuery] = useState('');
  const [limit, setLimit] = useState(PAGE);
  const rows = useMemo(() => addressRows(doc, marks, filter, query), [doc, marks, filter, query]);
  return (
    <Card testID="address-table">
      <Text variant="heading">Addresses</Text>
      <View style={styles.filters}>
        <View style={styles.filterCell}>
          <ChipPicker<AddressFilter>
            label="Show"
            chips={[
              { value: 'all', label: 'All ports' },
              { value: 'problems', label: 'With problems' },
              { value: 'unaddressed', label: 'Without address' },
            ]}
            value={filter}
            onChange={setFilter}
            testID="address-filter"
          />
        </View>
        <View style={styles.filterCell}>
          <TextField label="Find" value={query} onChangeText={setQuery} placeholder="device, port or address" autoCapitalize="none" testID="address-find" />
        </View>
      </View>
      <Text variant="small" color="inkMuted" testID="address-count">{`${rows.length} port${rows.length === 1 ? '' : 's'}`}</Text>
      {wide ? (
        <View style={[styles.row, styles.rowWide, styles.headerRow]}>
          <Text variant="smallStrong" style={styles.colName}>Device and port</Text>
          <Text variant="smallStrong" style={styles.colNetwork}>Network</Text>
          <Text variant="smallStrong" style={styles.colAddress}>Address</Text>
          <Text variant="smallStrong" style={styles.colStatus}>Status</Text>
        </View>
      ) : null}
      {rows.slice(0, limit).map((row) => (
        <Row key={row.portId} row={row} doc={doc} readOnly={readOnly} wide={wide} />
      ))}
      {rows.length > limit ? <Button label={`Show more (${rows.length - limit} left)`} variant="ghost" onPress={() => setLimit(limit + PAGE)} /> : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  filters: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  filterCell: { flexGrow: 1, flexBasis: 260 },
  row: { gap: space.sm, paddingVertical: space.sm, borderTopWidth: 1, borderTopColor: colors.line },
  rowWide: { flexDirection: 'row', alignItems: 'flex-start', gap: space.md },
  headerRow: { borderTopWidth: 0 },
  colName: { width: 170 },
  colNetwork: { flex: 3, minWidth: 220 },
  colAddress: { width: 170 },
  colStatus: { flex: 2, gap: space.xs, minWidth: 160 },
  status: { flexDirection: 'row', gap: space.xs, alignItems: 'flex-start' },
  statusText: { flex: 1 },
  inputWrap: { gap: 2 },
  input: { ...typeScale.body, color: colors.ink, minHeight: TAP_TARGET, paddingHorizontal: space.sm, borderWidth: 1, borderColor: colors.lineStrong, borderRadius: radius.sm, backgroundColor: colors.surface },
  inputInvalid: { borderColor: colors.danger, borderWidth: 2 },
});
