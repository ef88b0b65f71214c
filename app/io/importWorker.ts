// Entry of the import worker: reads picked or dropped trajectory files off the page's thread.
import { type ImportCommand, type ImportReply, importServer } from '../../src/io/importProtocol';

interface WorkerScope {
  postMessage(message: ImportReply, transfer: Transferable[]): void;
  addEventListener(type: 'message', listener: (event: MessageEvent<ImportCommand>) => void): void;
}

const scope = self as unknown as WorkerScope;
const serve = importServer((reply, transfer) => scope.postMessage(reply, transfer));
scope.addEventListener('message', (event) => serve(event.data));
