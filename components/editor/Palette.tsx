import { useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import Svg, { Path } from 'react-native-svg';
import { Banner, Button, Heading, Text, colors, radius, space, TAP_TARGET } from '@/components/ui';
import { INK, kindMarkFilled, kindMarkPath } from '@/lib/editor/drawing';
import { resolveOptions, TEMPLATES, type TemplateInfo } from '@/lib/editor/templates';
import { addFromPalette } from '@/components/editor/palette-actions';
import { PatternStarter } from '@/components/editor/PatternStarter';
import { TemplateOptions, type AnyOptions } from '@/components/editor/TemplateOptions';

function KindMark({ kind }: { kind: TemplateInfo['kind'] }) {
  const d = kindMarkPath(kind, 4, 4);
  return (
    <Svg width={24} height={24} viewBox="0 0 24 24" aria-hidden focusable={false}>
      {kindMarkFilled(kind) ? <Path d={d} fill={INK.ink} /> : <Path d={d} fill="none" stroke={INK.ink} strokeWidth={1.8} strokeLinecap="round" />}
    </Svg>
  );
}

function PaletteItem({ template, open, onToggle, onAdded }: { template: TemplateInfo; open: boolean; onToggle: () => void; onAdded: () => void }) {
  const [options, setOptions] = useState<AnyOptions>(() => resolveOptions(template.id) as AnyOptions);
  const [error, setError] = useState<string | null>(null);
  return (
    <View style={[styles.item, open && styles.itemOpen]}>
      <Pressable role="button" aria-expanded={open} aria-label={template.label} onPress={onToggle} testID={`palette-${template.id}`} style={({ pressed }) => [styles.itemHead, pressed && styles.pressed]}>
        <KindMark kind={template.kind} />
        <Text variant="bodyStrong" style={styles.itemLabel}>
          {template.label}
        </Text>
        <Text variant="small" color="primary">
          {open ? 'Close' : 'Choose'}
        </Text>
      </Pressable>
      {open ? (
        <View style={styles.options}>
          <TemplateOptions template={template} value={options} onChange={setOptions} />
          {error ? <Banner tone="error">{error}</Banner> : null}
          <Button
            label={`Add ${template.label.toLowerCase()}`}
            fullWidth
            testID={`palette-add-${template.id}`}
            onPress={() => {
              const refusal = addFromPalette(template.id, options);
              setError(refusal);
              if (!refusal) onAdded();
            }}
          />
        </View>
      ) : null}
    </View>
  );
}

/**
 * The palette: each template with its counts, and pattern starters. `showTitle` is false inside the
 * phone's sheet, whose own header already says it.
 */
export function Palette({ onAdded, showTitle = true }: { onAdded?: () => void; showTitle?: boolean }) {
  const [open, setOpen] = useState<string | null>(null);
  return (
    <View style={styles.wrap} testID="palette">
      {showTitle ? (
        <Heading level={2} variant="bodyStrong">
          Add to the canvas
        </Heading>
      ) : null}
      {TEMPLATES.map((t) => (
        <PaletteItem key={t.id} template={t} open={open === t.id} onToggle={() => setOpen(open === t.id ? null : t.id)} onAdded={() => onAdded?.()} />
      ))}
      <PatternStarter onApplied={() => onAdded?.()} />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  item: { borderWidth: 1, borderColor: colors.line, borderRadius: radius.md, backgroundColor: colors.surface },
  itemOpen: { borderColor: colors.primary },
  itemHead: { flexDirection: 'row', alignItems: 'center', gap: space.sm, minHeight: TAP_TARGET, paddingHorizontal: space.sm, borderRadius: radius.md },
  itemLabel: { flex: 1 },
  pressed: { backgroundColor: colors.surfaceSunken },
  options: { padding: space.sm, gap: space.md, borderTopWidth: 1, borderTopColor: colors.line },
});
