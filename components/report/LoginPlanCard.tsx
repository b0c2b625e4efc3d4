import { StyleSheet, View } from 'react-native';
import { Card, Heading, Text, colors, space } from '@/components/ui';
import { QueryStatus } from '@/components/designs/QueryStatus';
import { useLoginPlan } from '@/lib/api/handover';
import { plural } from '@/lib/designs/summary';
import type { LoginHost, LoginPort, LoginTarget } from '@/shared/handover/login-plan';

/**
 * The login plan of the version (GET …/login-plan): per host, each storage port with its address and
 * network, and the target portals (address:3260) and target names it logs in to. The session count
 * per host is the report's own.
 */
export function LoginPlanCard({ id, n }: { id: number; n: number }) {
  const plan = useLoginPlan(id, n);
  return (
    <Card testID="report-login-plan">
      <Heading level={2}>Login plan</Heading>
      <Text variant="small" color="inkMuted">
        Each host port logs in to these target portals (iSCSI listens on TCP port 3260). Set the discovery and the sessions on each host exactly as listed.
      </Text>
      <QueryStatus query={plan} what="The login plan" testID="report-login-plan-error" />
      {plan.data && plan.data.hosts.length === 0 ? <Text color="inkMuted">No host has a storage port yet.</Text> : null}
      {plan.data?.hosts.map((host) => <HostPlan key={host.host} host={host} />)}
    </Card>
  );
}

function HostPlan({ host }: { host: LoginHost }) {
  const tid = `login-plan-${host.host}`;
  return (
    <View style={styles.host} testID={tid}>
      <Text variant="bodyStrong">{host.name}</Text>
      <Text variant="small" selectable testID={`${tid}-initiator`}>
        {host.initiator ? `Initiator ${host.initiator}` : 'No initiator name yet'}
      </Text>
      <Text variant="small" testID={`${tid}-sessions`}>{`${plural(host.expectedSessions, 'session')} expected`}</Text>
      {host.ports.map((port) => (
        <PortPlan key={port.port} port={port} tid={`${tid}-port-${port.port}`} />
      ))}
    </View>
  );
}

function portHeading(port: LoginPort): string {
  const address = port.address === null ? 'no address yet' : port.address === 'dhcp' ? 'DHCP' : port.address;
  return `${port.cardName} ${port.portName} · ${address} · ${port.networkName ?? 'no network'}`;
}

function targetLine(target: LoginTarget): string {
  const portal = target.portal ?? `no address yet on ${target.controllerName} ${target.portName}`;
  return `${portal} → ${target.iqn ?? `${target.arrayName} has no target name yet`} (${target.controllerName} ${target.portName})`;
}

function PortPlan({ port, tid }: { port: LoginPort; tid: string }) {
  return (
    <View style={styles.port} testID={tid}>
      <Text variant="smallStrong">{portHeading(port)}</Text>
      {port.targets.length === 0 ? (
        <Text variant="small" color="dangerText">No target portal reachable from this port.</Text>
      ) : (
        port.targets.map((target) => (
          <Text key={target.port} variant="small" selectable testID={`${tid}-target`}>
            {targetLine(target)}
          </Text>
        ))
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  host: { gap: 2, paddingVertical: space.sm, borderTopWidth: 1, borderTopColor: colors.line },
  port: { gap: 2, paddingLeft: space.md, paddingTop: space.xs },
});
