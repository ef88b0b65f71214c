// Entry of the import worker: reads picked or dropped trajectory files off the page's thread.
import {
  answerImport,
  type ImportReply,
  type TrajectoryImportRequest,
} from '../../src/io/importProtocol';

interface WorkerScope {
  postMessage(message: ImportReply, transfer: Transferable[]): void;
  addEventListener(
    type: 'message',
    listener: (event: MessageEvent<TrajectoryImportRequest>) => void,
  ): void;
}

const scope = self as unknown as WorkerScope;
scope.addEventListener('message', (event) => {
  void answerImport(event.data).then(({ reply, transfer }) => scope.postMessage(reply, transfer));
});
