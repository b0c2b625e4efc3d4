import { StyleSheet, View } from 'react-native';
import { CONNECTORS, type Connector, type PortSpeed } from '@/shared/topology/schema';
import type { ArrayOptions, HostOptions, SwitchOptions, TemplateInfo } from '@/lib/editor/templates';
import { space } from '@/components/ui';
import { ChipPicker } from '@/components/inspector/ChipPicker';
import { SPEED_CHIPS } from '@/components/inspector/PortInspector';
import { NumberStepper } from '@/components/editor/NumberStepper';

const CONNECTOR_CHIPS = CONNECTORS.map((c) => ({ value: c, label: c === 'rj45' ? 'RJ45' : 'SFP' }));
const YES_NO = [
  { value: 'yes', label: 'Yes' },
  { value: 'no', label: 'No' },
] as const;

export type AnyOptions = ArrayOptions | SwitchOptions | HostOptions;

type Props = { template: TemplateInfo; value: AnyOptions; onChange: (value: AnyOptions) => void };

/** The counts and port kind of a palette device, starting from the template's defaults. */
export function TemplateOptions({ template, value, onChange }: Props) {
  const id = `palette-${template.id}`;
  const set = (patch: Partial<ArrayOptions & SwitchOptions & HostOptions>) => onChange({ ...value, ...patch } as AnyOptions);
  const common = (
    <>
      <ChipPicker<PortSpeed> label="Port speed" chips={SPEED_CHIPS} value={value.speedGbps} onChange={(speedGbps) => set({ speedGbps })} testID={`${id}-speed`} />
      <ChipPicker<Connector> label="Connector" chips={CONNECTOR_CHIPS} value={value.connector} onChange={(connector) => set({ connector })} testID={`${id}-connector`} />
    </>
  );
  if (template.kind === 'array') {
    const o = value as ArrayOptions;
    return (
      <View style={styles.wrap}>
        <NumberStepper label="Controllers" value={o.controllers} min={1} max={4} onChange={(controllers) => set({ controllers })} testID={`${id}-controllers`} />
        <NumberStepper label="Data ports per controller" value={o.dataPorts} min={0} max={32} onChange={(dataPorts) => set({ dataPorts })} testID={`${id}-ports`} />
        {common}
        <ChipPicker label="Management port on each controller" chips={YES_NO} value={o.managementPort ? 'yes' : 'no'} onChange={(v) => set({ managementPort: v === 'yes' })} testID={`${id}-mgmt`} />
      </View>
    );
  }
  if (template.kind === 'host') {
    const o = value as HostOptions;
    return (
      <View style={styles.wrap}>
        <NumberStepper label="Cards" value={o.cards} min={0} max={8} onChange={(cards) => set({ cards })} testID={`${id}-cards`} />
        <NumberStepper label="Ports per card" value={o.portsPerCard} min={1} max={8} onChange={(portsPerCard) => set({ portsPerCard })} testID={`${id}-ports`} />
        {common}
        <ChipPicker label="Onboard management port" chips={YES_NO} value={o.onboardManagement ? 'yes' : 'no'} onChange={(v) => set({ onboardManagement: v === 'yes' })} testID={`${id}-mgmt`} />
      </View>
    );
  }
  const o = value as SwitchOptions;
  return (
    <View style={styles.wrap}>
      <NumberStepper label="Ports" value={o.ports} min={1} max={128} onChange={(ports) => set({ ports })} testID={`${id}-ports`} />
      {common}
    </View>
  );
}

const styles = StyleSheet.create({ wrap: { gap: space.md } });
