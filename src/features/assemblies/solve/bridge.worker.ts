import type { BridgeModelInput } from '@shared/calc/bridge/schema';
import { runBridge } from './run-bridge';

/** The worker's scope, as much of it as is used (the client's types are the DOM's). */
const scope = self as unknown as {
  onmessage: (e: MessageEvent<BridgeModelInput>) => void;
  postMessage: (message: unknown) => void;
};

/** One solve per message: the model in, its outcome out (the page terminates the worker to cancel). */
scope.onmessage = (e) => scope.postMessage(runBridge(e.data));
