import { useStore } from 'zustand';
import { canvasUiStore } from '@/lib/editor/canvas-ui';
import { subjectLabel } from '@/lib/editor/describe';
import { useEditorDoc } from '@/lib/editor/hooks';
import { ConnectList } from '@/components/editor/ConnectList';
import { DevicePortList } from '@/components/editor/DevicePortList';
import { Overlay } from '@/components/editor/Overlay';

/** The wide screen's "Connect to…" and port list: the same lists as the phone's sheets, in a dialog. */
export function PortListOverlays() {
  const doc = useEditorDoc();
  const connectFrom = useStore(canvasUiStore, (s) => s.connectFrom);
  const portList = useStore(canvasUiStore, (s) => s.portList);
  if (connectFrom) {
    return (
      <Overlay title="Connect to…" wide onClose={() => canvasUiStore.setState({ connectFrom: null })} testID="sheet-connect">
        <ConnectList from={connectFrom} />
      </Overlay>
    );
  }
  if (portList) {
    return (
      <Overlay title={`Ports of ${subjectLabel(doc, portList.deviceId)}`} wide onClose={() => canvasUiStore.setState({ portList: null })} testID="sheet-ports">
        <DevicePortList deviceId={portList.deviceId} />
      </Overlay>
    );
  }
  return null;
}
