import { useState } from 'react';
import { StyleSheet, useWindowDimensions, View } from 'react-native';
import { Link } from 'expo-router';
import { Button, Icon, Screen, Text, TextField, WIDE_BREAKPOINT, space } from '@/components/ui';
import { DesignList } from '@/components/designs/DesignList';
import { DesignTable } from '@/components/designs/DesignTable';
import { DesignsEmpty } from '@/components/designs/DesignsEmpty';
import { QueryStatus } from '@/components/designs/QueryStatus';
import { useMe } from '@/lib/api/auth';
import { useDesigns } from '@/lib/api/designs';
import { useTeam } from '@/lib/api/team';
import { newDesignHref } from '@/lib/designs/links';
import { useDebouncedValue } from '@/lib/use-debounced-value';
import { can } from '@/shared/roles';

/** Searching asks the server (name or site), once typing pauses. */
const SEARCH_DELAY_MS = 250;

/** The team's designs: a list of cards on a phone, a table on a wide screen. */
export function DesignsScreen() {
  const me = useMe();
  const team = useTeam();
  const [query, setQuery] = useState('');
  const settled = useDebouncedValue(query, SEARCH_DELAY_MS);
  const designs = useDesigns(settled);
  const { width } = useWindowDimensions();
  const wide = width >= WIDE_BREAKPOINT;
  const role = me.data?.role;
  const editor = role ? can(role, 'editDesigns') : false;
  const teamName = team.data?.team.name ?? 'your team';
  const intro = role === 'installer' ? `Approved designs of ${teamName}, ready to build.` : `Storage-network designs of ${teamName}.`;
  const list = designs.data?.designs ?? [];
  const total = designs.data?.total ?? list.length;
  const searching = settled.trim() !== '';

  return (
    <Screen title="Designs" intro={intro} testID="designs-screen" maxWidth={wide ? 1200 : undefined}>
      <View style={[styles.tools, wide && styles.toolsWide]}>
        <View style={styles.search}>
          <TextField
            label="Search designs"
            hint="By name or site"
            value={query}
            onChangeText={setQuery}
            inputMode="search"
            autoCapitalize="none"
            testID="designs-search"
          />
        </View>
        {editor ? (
          <Link href={newDesignHref} asChild>
            <Button label="New design" icon={<Icon name="designs" size={18} color="onPrimary" />} testID="designs-new" />
          </Link>
        ) : null}
      </View>
      <QueryStatus query={designs} what="Designs" testID="designs-error" />
      {designs.data && list.length === 0 ? <DesignsEmpty role={role} search={searching ? settled.trim() : null} teamName={teamName} /> : null}
      {list.length > 0 ? (
        <>
          <Text variant="small" color="inkMuted" testID="designs-count" aria-live="polite">
            {searching ? `${total} matching “${settled.trim()}”` : `${total} ${total === 1 ? 'design' : 'designs'}`}
            {list.length < total ? `, ${list.length} shown` : ''}
          </Text>
          {wide ? <DesignTable designs={list} /> : <DesignList designs={list} />}
          {designs.hasNextPage ? (
            <Button
              label="Show more designs"
              variant="secondary"
              loading={designs.isFetchingNextPage}
              loadingLabel="Loading more designs"
              onPress={() => void designs.fetchNextPage()}
              testID="designs-more"
            />
          ) : null}
        </>
      ) : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  tools: { gap: space.md },
  toolsWide: { flexDirection: 'row', alignItems: 'flex-end', justifyContent: 'space-between' },
  search: { flexGrow: 1, maxWidth: 480 },
});
