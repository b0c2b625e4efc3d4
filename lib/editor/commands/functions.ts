/** Every command as a plain function `(doc, args) => doc`; the keys are the registry's names. */
export { addDevice, deleteDevices, renameDevice, renamePart, setControllerIqn, setDevice } from '@/lib/editor/commands/devices';
export { addAdapter, addController, addPort, removeAdapter, removeController, removePort, setPort } from '@/lib/editor/commands/ports';
export { cablePorts, setCable, uncable, uncablePort } from '@/lib/editor/commands/cabling';
export { addNetwork, removeNetwork, renameDesign, setChap, updateNetwork } from '@/lib/editor/commands/networks';
export { autoAssignAddresses, clearAddresses } from '@/lib/editor/commands/addressing';
export { autoArrange, moveDevice, moveDevices } from '@/lib/editor/commands/layout';
export { applyPattern } from '@/lib/editor/commands/patterns';
export { deleteItems } from '@/lib/editor/commands/selection';
export { assignNetwork } from '@/lib/editor/commands/assign-network';
export { addFeed, removeFeed, setPsus } from '@/lib/editor/commands/power';
