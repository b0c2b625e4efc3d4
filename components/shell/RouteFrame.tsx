import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { Redirect, type Href } from 'expo-router';
import { SessionLoading } from '@/components/shell/SessionStates';

type RouteFrameProps = { children: ReactNode; loading?: boolean; hidden?: boolean; redirect?: Href | null };

/**
 * Keeps a layout's navigator (its Slot) mounted while the session is checked or a redirect runs.
 * The router drops the child route from its state when a layout renders something else instead of
 * the Slot; the address then reads "/" and a layout that decides by address loops or redirects
 * with the wrong `next`. So the Slot stays, hidden if need be, and loading or redirect sit beside it.
 */
export function RouteFrame({ children, loading = false, hidden = false, redirect = null }: RouteFrameProps) {
  return (
    <View style={styles.frame}>
      <View style={[styles.frame, hidden && styles.hidden]} aria-hidden={hidden}>
        {children}
      </View>
      {loading || redirect ? (
        <View style={StyleSheet.absoluteFill}>
          <SessionLoading />
        </View>
      ) : null}
      {redirect ? <Redirect href={redirect} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  frame: { flex: 1 },
  hidden: { display: 'none' },
});
