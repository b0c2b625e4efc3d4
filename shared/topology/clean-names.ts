import { cleanText } from '@/shared/text/clean';
import type { Topology } from '@/shared/topology/schema';

/**
 * Every name and label of a document through cleanText (shared/text/clean.ts): the document's
 * name, each device's and PSU's name, each rack's name and row, each power feed's name, each controller's, card's and port's name, each cable's
 * label and each network's name. Ids are left exactly as they are: they are references, not text
 * to show, and changing one would break what points at it. The IQN is left too: a control
 * character there is a mistake the analysis reports (iqn-invalid), not one to hide.
 *
 * Works in place, on a document the caller owns (the validator's freshly parsed copy), so a
 * 100,000-port document is walked once and nothing is copied.
 */
type Named = { name: string };

function cleanName(thing: Named): void {
  const clean = cleanText(thing.name);
  if (clean !== thing.name) thing.name = clean;
}

function cleanPorts(ports: Named[]): void {
  for (const port of ports) cleanName(port);
}

export function cleanDocumentText(doc: Topology): Topology {
  cleanName(doc);
  for (const device of doc.devices) {
    cleanName(device);
    for (const psu of device.psus ?? []) cleanName(psu);
    if (device.kind === 'switch') cleanPorts(device.ports);
    else {
      for (const group of device.kind === 'array' ? device.controllers : device.adapters) {
        cleanName(group);
        cleanPorts(group.ports);
      }
    }
  }
  for (const cable of doc.cables) if (cable.label !== undefined) cable.label = cleanText(cable.label);
  for (const network of doc.networks) cleanName(network);
  for (const rack of doc.racks ?? []) {
    cleanName(rack);
    if (rack.row !== undefined) rack.row = cleanText(rack.row);
  }
  for (const feed of doc.powerFeeds ?? []) cleanName(feed);
  return doc;
}
