import { pathToSharedTransfer, pathToTransfer, transferBuffers } from '../path/pathTransfer';
import type { SampledPath } from '../path/sampledPath';
import type { Charge } from '../physics/charge';
import { defaultNearRadius } from './computeSlice';
import { computeSliceRows, type KernelStats } from './sliceKernel';
import { allocateSliceFields, PLANE_COUNT, type SliceFields } from './slicePlanes';
import type { SliceSpec } from './sliceSpec';
import {
  COMMANDS,
  type PathTransfer,
  REPLIES,
  type SceneCommand,
  type WorkerPort,
  type WorkerReply,
} from './workerProtocol';

export interface SlicePoolOptions {
  /** Makes one worker; omitted or size 0 means every slice runs on the calling thread. */
  createPort?: () => WorkerPort;
  size: number;
  /** A tile not answered in this time (ms) counts as a dead worker. */
  tileTimeoutMs?: number;
  /** Told, in one line, whenever a worker failed and was replaced. */
  onFault?: (message: string) => void;
  clock?: () => number;
  /** Points below which a tile costs more in messages than it gains in balance (default 2048). */
  minTilePoints?: number;
}

export interface SliceRequestOptions {
  nearRadius?: number;
  /** Compute a grid this many times coarser first and hand it to onCoarse. */
  coarseFactor?: number;
  onCoarse?: (fields: SliceFields) => void;
}

export interface SliceResult {
  fields: SliceFields;
  stats: KernelStats & { ms: number; threads: number; tiles: number; faults: number };
}

interface TileJob {
  j0: number;
  j1: number;
  attempts: number;
}

interface Phase {
  id: number;
  spec: SliceSpec;
  fields: SliceFields;
  nearRadius: number;
  remaining: number;
  stats: SliceResult['stats'];
  started: number;
  warm: Float64Array | null;
  resolve: (result: SliceResult | null) => void;
}

const NO_PORT: WorkerPort = {
  post: () => {},
  onMessage: () => {},
  onFailure: () => {},
  terminate: () => {},
};

interface Slot {
  port: WorkerPort;
  job: TileJob | null;
  timer: ReturnType<typeof setTimeout> | null;
}

/**
 * Splits slices into row tiles over a pool of field workers. A newer request overtakes an
 * older one: its queued tiles are dropped, running ones stop at their next check of the
 * shared flag, and the older promise resolves to null. Dead, hung or throwing workers are
 * replaced and their tile recomputed; a tile that fails twice runs on the calling thread.
 */
export class SlicePool {
  readonly size: number;
  private readonly slots: Slot[] = [];
  private readonly queue: TileJob[] = [];
  private readonly latest: Int32Array | null;
  private readonly clock: () => number;
  private readonly timeoutMs: number;
  private charges: readonly Charge[] = [];
  /** The scene in shared memory, made once per scene and read by every worker. */
  private sharedScene: SceneCommand['charges'] | null = null;
  /** The paths of the last shared scene: a new scene that keeps a path does not copy it again. */
  private sharedPaths = new Map<SampledPath, PathTransfer>();
  private sceneId = 0;
  private nextId = 1;
  private phase: Phase | null = null;
  private warmKey = '';
  private warm: Float64Array | null = null;
  private disposed = false;

  constructor(private readonly options: SlicePoolOptions) {
    this.size = options.createPort ? Math.max(0, Math.floor(options.size)) : 0;
    this.clock = options.clock ?? (() => performance.now());
    this.timeoutMs = options.tileTimeoutMs ?? 30_000;
    this.latest =
      typeof SharedArrayBuffer === 'function' ? new Int32Array(new SharedArrayBuffer(4)) : null;
    for (let w = 0; w < this.size; w++) {
      const slot: Slot = { port: NO_PORT, job: null, timer: null };
      this.attach(slot);
      this.slots.push(slot);
    }
  }

  /** Sends new charges to every worker; later requests use them. */
  setScene(charges: readonly Charge[]): void {
    this.charges = charges;
    this.sharedScene = null;
    this.sceneId++;
    for (const slot of this.slots) this.postScene(slot.port);
  }

  /** Computes a slice; resolves null when a newer request overtook this one. */
  async request(spec: SliceSpec, options: SliceRequestOptions = {}): Promise<SliceResult | null> {
    const id = this.nextId++;
    if (this.latest !== null) Atomics.store(this.latest, 0, id);
    this.cancelPhase();
    const nearRadius = options.nearRadius ?? defaultNearRadius(spec);
    const factor = Math.floor(options.coarseFactor ?? 1);
    if (factor > 1 && spec.nx >= 2 * factor && spec.ny >= 2 * factor) {
      const coarseSpec = {
        ...spec,
        nx: Math.ceil(spec.nx / factor),
        ny: Math.ceil(spec.ny / factor),
      };
      const coarse = await this.runPhase(id, coarseSpec, nearRadius, null);
      if (coarse === null) return null;
      options.onCoarse?.(coarse.fields);
    }
    return this.runPhase(id, spec, nearRadius, this.warmFor(spec));
  }

  dispose(): void {
    this.disposed = true;
    this.cancelPhase();
    for (const slot of this.slots) {
      if (slot.timer !== null) clearTimeout(slot.timer);
      slot.port.terminate();
    }
    this.slots.length = 0;
  }

  private warmFor(spec: SliceSpec): Float64Array {
    const key = `${spec.nx}x${spec.ny}x${this.charges.length}`;
    if (key !== this.warmKey || this.warm === null) {
      this.warmKey = key;
      this.warm = new Float64Array(spec.nx * spec.ny * this.charges.length).fill(Number.NaN);
    }
    return this.warm;
  }

  private runPhase(
    id: number,
    spec: SliceSpec,
    nearRadius: number,
    warm: Float64Array | null,
  ): Promise<SliceResult | null> {
    if (this.disposed || (this.latest !== null && Atomics.load(this.latest, 0) !== id)) {
      return Promise.resolve(null);
    }
    return new Promise((resolve) => {
      const fields = allocateSliceFields(spec.nx, spec.ny, spec.time);
      const stats = {
        points: 0,
        iterations: 0,
        maxIterations: 0,
        ms: 0,
        threads: Math.max(1, this.size),
        tiles: 0,
        faults: 0,
      };
      const phase: Phase = {
        id,
        spec,
        fields,
        nearRadius,
        remaining: 0,
        stats,
        started: this.clock(),
        warm,
        resolve,
      };
      if (this.size === 0) {
        this.runOnThisThread(phase, 0, spec.ny);
        stats.tiles = 1;
        stats.ms = this.clock() - phase.started;
        resolve({ fields, stats });
        return;
      }
      // About four tiles per worker balances load; small slices (a coarse pass) get one per
      // worker, as each tile costs two messages and a copy on the calling thread.
      const balanced = Math.ceil(spec.ny / (4 * this.size));
      const worthwhile = Math.ceil((this.options.minTilePoints ?? 2048) / spec.nx);
      const rows = Math.max(
        1,
        Math.min(Math.ceil(spec.ny / this.size), Math.max(balanced, worthwhile)),
      );
      for (let j0 = 0; j0 < spec.ny; j0 += rows) {
        this.queue.push({ j0, j1: Math.min(spec.ny, j0 + rows), attempts: 0 });
      }
      phase.remaining = this.queue.length;
      stats.tiles = this.queue.length;
      this.phase = phase;
      this.dispatch();
    });
  }

  private cancelPhase(): void {
    this.queue.length = 0;
    const phase = this.phase;
    this.phase = null;
    phase?.resolve(null);
  }

  private dispatch(): void {
    const phase = this.phase;
    if (phase === null) return;
    for (const slot of this.slots) {
      if (slot.job !== null) continue;
      const job = this.queue.shift();
      if (job === undefined) return;
      this.post(slot, job, phase);
    }
  }

  private post(slot: Slot, job: TileJob, phase: Phase): void {
    const { spec } = phase;
    const tilePoints = spec.nx * (job.j1 - job.j0);
    const chargeCount = this.charges.length;
    const warm = new Float64Array(chargeCount * tilePoints).fill(Number.NaN);
    if (phase.warm !== null) {
      const n = spec.nx * spec.ny;
      for (let k = 0; k < chargeCount; k++) {
        const from = k * n + job.j0 * spec.nx;
        warm.set(phase.warm.subarray(from, from + tilePoints), k * tilePoints);
      }
    }
    slot.job = job;
    slot.timer = setTimeout(() => this.fail(slot, 'did not answer in time'), this.timeoutMs);
    slot.port.post(
      {
        type: COMMANDS.tile,
        requestId: phase.id,
        sceneId: this.sceneId,
        spec,
        j0: job.j0,
        j1: job.j1,
        nearRadius: phase.nearRadius,
        warm,
        latest: this.latest,
      },
      [warm.buffer],
    );
  }

  private receive(slot: Slot, reply: WorkerReply): void {
    if (slot.timer !== null) clearTimeout(slot.timer);
    slot.timer = null;
    const job = slot.job;
    slot.job = null;
    const phase = this.phase;
    if (reply.type === REPLIES.failed) {
      if (phase !== null && job !== null && reply.requestId === phase.id) {
        this.replace(slot, `threw: ${reply.message}`, job, phase);
        return;
      }
    } else if (reply.type === REPLIES.tile && phase !== null && reply.requestId === phase.id) {
      this.store(phase, reply.j0, reply.j1, reply.planes, reply.mask, reply.warm, reply.stats);
    }
    this.dispatch();
  }

  private fail(slot: Slot, why: string): void {
    const job = slot.job;
    const phase = this.phase;
    if (slot.timer !== null) clearTimeout(slot.timer);
    slot.timer = null;
    slot.job = null;
    if (phase !== null && job !== null) this.replace(slot, why, job, phase);
    else {
      this.options.onFault?.(`field worker ${why}; replaced it`);
      this.respawn(slot);
    }
  }

  /** Swaps a failed worker for a fresh one and gets its tile computed again. */
  private replace(slot: Slot, why: string, job: TileJob, phase: Phase): void {
    phase.stats.faults++;
    this.options.onFault?.(
      `field worker ${why}; replaced it and recomputed rows ${job.j0}–${job.j1 - 1}`,
    );
    this.respawn(slot);
    job.attempts++;
    if (job.attempts >= 2) {
      this.runOnThisThread(phase, job.j0, job.j1);
      this.finishTile(phase);
    } else {
      this.queue.unshift(job);
    }
    this.dispatch();
  }

  private respawn(slot: Slot): void {
    slot.port.terminate();
    this.attach(slot);
  }

  private runOnThisThread(phase: Phase, j0: number, j1: number): void {
    const { spec, fields } = phase;
    const n = spec.nx * spec.ny;
    const target = { planes: fields.planes, mask: fields.mask, points: n, row0: 0 };
    computeSliceRows(spec, this.charges, j0, j1, target, phase.nearRadius, phase.warm, phase.stats);
  }

  private store(
    phase: Phase,
    j0: number,
    j1: number,
    planes: Float32Array,
    mask: Uint8Array,
    warm: Float64Array,
    stats: KernelStats,
  ): void {
    const { spec, fields } = phase;
    const n = spec.nx * spec.ny;
    const tilePoints = spec.nx * (j1 - j0);
    for (let k = 0; k < PLANE_COUNT; k++) {
      fields.planes.set(
        planes.subarray(k * tilePoints, (k + 1) * tilePoints),
        k * n + j0 * spec.nx,
      );
    }
    fields.mask.set(mask, j0 * spec.nx);
    if (phase.warm !== null) {
      for (let k = 0; k < this.charges.length; k++) {
        phase.warm.set(warm.subarray(k * tilePoints, (k + 1) * tilePoints), k * n + j0 * spec.nx);
      }
    }
    phase.stats.points += stats.points;
    phase.stats.iterations += stats.iterations;
    phase.stats.maxIterations = Math.max(phase.stats.maxIterations, stats.maxIterations);
    this.finishTile(phase);
  }

  private finishTile(phase: Phase): void {
    phase.remaining--;
    if (phase.remaining > 0 || this.phase !== phase) return;
    this.phase = null;
    phase.stats.ms = this.clock() - phase.started;
    phase.resolve({ fields: phase.fields, stats: phase.stats });
  }

  /** Gives the slot a fresh worker whose replies are routed to this slot while it is current. */
  private attach(slot: Slot): void {
    const create = this.options.createPort;
    if (create === undefined) throw new Error('slice pool has no worker factory');
    const port = create();
    slot.port = port;
    port.onMessage((reply) => {
      if (slot.port === port) this.receive(slot, reply);
    });
    port.onFailure((message) => {
      if (slot.port === port && !this.disposed) this.fail(slot, `stopped: ${message}`);
    });
    this.postScene(port);
  }

  private postScene(port: WorkerPort): void {
    if (typeof SharedArrayBuffer === 'function') {
      if (this.sharedScene === null) {
        const before = this.sharedPaths;
        this.sharedPaths = new Map(
          this.charges.map((c) => [c.path, before.get(c.path) ?? pathToSharedTransfer(c.path)]),
        );
        this.sharedScene = this.charges.map((c) => ({
          charge: c.charge,
          path: this.sharedPaths.get(c.path)!,
        }));
      }
      port.post({ type: COMMANDS.scene, sceneId: this.sceneId, charges: this.sharedScene }, []);
      return;
    }
    // Without shared memory each worker gets its own copy, handed over rather than cloned.
    const charges = this.charges.map((c) => ({ charge: c.charge, path: pathToTransfer(c.path) }));
    const transfer = charges.flatMap((c) => transferBuffers(c.path));
    port.post({ type: COMMANDS.scene, sceneId: this.sceneId, charges }, transfer);
  }
}
