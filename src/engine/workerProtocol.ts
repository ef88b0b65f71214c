import type { KernelStats } from './sliceKernel';
import type { SliceSpec } from './sliceSpec';

/** The messages between the slice pool and its field workers, in one place. */
export const COMMANDS = {
  scene: 'scene',
  tile: 'tile',
} as const;

export const REPLIES = {
  tile: 'tile-done',
  cancelled: 'tile-cancelled',
  failed: 'tile-failed',
} as const;

/** A path as plain columns with every derivative filled in, ready to restore without a spline. */
export interface PathTransfer {
  t: Float64Array;
  x: Float64Array;
  y: Float64Array;
  z: Float64Array;
  vx: Float64Array;
  vy: Float64Array;
  vz: Float64Array;
  ax: Float64Array;
  ay: Float64Array;
  az: Float64Array;
  maxSpeed: number;
}

export interface SceneCommand {
  type: typeof COMMANDS.scene;
  sceneId: number;
  charges: { charge: number; path: PathTransfer }[];
}

export interface TileCommand {
  type: typeof COMMANDS.tile;
  requestId: number;
  sceneId: number;
  spec: SliceSpec;
  j0: number;
  j1: number;
  nearRadius: number;
  /** Previous delays for this tile, one plane per charge (NaN where unknown); transferred. */
  warm: Float64Array;
  /** Shared [latest request id]: a worker abandons a tile once a newer request is posted. */
  latest: Int32Array | null;
}

export type WorkerCommand = SceneCommand | TileCommand;

export interface TileReply {
  type: typeof REPLIES.tile;
  requestId: number;
  j0: number;
  j1: number;
  planes: Float32Array;
  mask: Uint8Array;
  warm: Float64Array;
  stats: KernelStats;
  ms: number;
}

export interface TileCancelled {
  type: typeof REPLIES.cancelled;
  requestId: number;
  j0: number;
}

export interface TileFailed {
  type: typeof REPLIES.failed;
  requestId: number;
  j0: number;
  message: string;
}

export type WorkerReply = TileReply | TileCancelled | TileFailed;

/** What the pool needs of a worker, whatever runtime it lives in. */
export interface WorkerPort {
  post(message: WorkerCommand, transfer: Transferable[]): void;
  onMessage(handler: (reply: WorkerReply) => void): void;
  /** Called when the worker dies or throws outside a handled tile. */
  onFailure(handler: (message: string) => void): void;
  terminate(): void;
}

/** The worker side: how a worker receives commands and replies. */
export interface WorkerEndpoint {
  post(reply: WorkerReply, transfer: Transferable[]): void;
  onMessage(handler: (command: WorkerCommand) => void): void;
}
