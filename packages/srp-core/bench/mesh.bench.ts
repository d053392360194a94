/**
 * Mesh SRP benchmark (figures printed, nothing asserted), issue 8 item 6: a ~10 000-triangle
 * box-wing mesh (subdivided bus, two wings on booms, an antenna dish shading part of the bus),
 * the full 5° coefficient table (37 × 72 = 2664 Sun directions) at 4 samples per facet:
 * - on one core: wall time, rays cast, rays per second (target: under 30 s);
 * - the polar rows in 8 chunks over 2 worker_threads (as the API spreads queued jobs): wall
 *   time including the workers' start-up and scene building, and the speed-up.
 * - shadow rays per second of our BVH against three-mesh-bvh (when installed as a devDependency).
 *
 * In a worker thread this same file computes its share of rows and posts them back.
 */
import { isMainThread, parentPort, Worker } from 'node:worker_threads';
import { coefficientTableShape, computeCoefficientTableRows, assembleCoefficientTable } from '../src/mesh/coefficient-table';
import { anyHit, createMeshRay } from '../src/mesh/mesh-bvh';
import { createMeshScene, type MeshScene } from '../src/mesh/mesh-scene';
import { boxWingMesh } from '../src/mesh/mesh-test-helpers';
import type { CoefficientTableSettings, MeshOpticsInput } from '../src/mesh/mesh-types';
import { referenceLoopNs } from './measure';

const DETAIL = process.env.MESH_BENCH_SMALL ? { bus: 6, wing: 12, dish: 6 } : { bus: 20, wing: 45, dish: 20 };
const OPTICS: MeshOpticsInput = {
  default: { front: 'mli-kapton' },
  groups: {
    wing: { front: 'solar-cell', back: 'solar-array-back' },
    dish: { front: 'osr-radiator', back: 'mli-kapton' },
  },
};
const SETTINGS: CoefficientTableSettings = { stepDeg: 5, samplesPerFacet: 4, specularBounce: false };

function buildScene(): MeshScene {
  return createMeshScene(boxWingMesh(DETAIL), OPTICS);
}

/** A block of polar rows, as one queued job of the API would compute. */
interface RowChunk {
  first: number;
  end: number;
}
interface ChunkResult extends RowChunk {
  values: Float64Array;
  rays: number;
  ms: number;
}

if (!isMainThread) {
  // A worker builds the scene once, then computes the chunks it is sent.
  const scene = buildScene();
  parentPort!.on('message', (chunk: RowChunk) => {
    const started = performance.now();
    const rows = computeCoefficientTableRows(scene, SETTINGS, chunk.first, chunk.end);
    const result: ChunkResult = { ...chunk, values: rows.values, rays: rows.rays, ms: performance.now() - started };
    parentPort!.postMessage(result, [rows.values.buffer as ArrayBuffer]);
  });
} else {
  await main();
}

/**
 * The table's rows in `chunkCount` chunks over `workerCount` worker threads, each taking the next
 * chunk when done (as queued jobs spread over workers): work balances even though rows differ in
 * cost. Returns the chunks in row order.
 */
async function computeOnWorkers(polarCount: number, chunkCount: number, workerCount: number): Promise<ChunkResult[]> {
  const chunks: RowChunk[] = [];
  for (let c = 0; c < chunkCount; c += 1) {
    chunks.push({ first: Math.round((c * polarCount) / chunkCount), end: Math.round(((c + 1) * polarCount) / chunkCount) });
  }
  // A worker does not get the parent's `--import tsx` loader hooks (Node 20): it loads this .ts
  // file through tsx's API instead.
  const tsxApi = import.meta.resolve('tsx/esm/api');
  const self = JSON.stringify(import.meta.url);
  const bootstrap = `import(${JSON.stringify(tsxApi)}).then((api) => api.tsImport(${self}, ${self}));`;
  const results: ChunkResult[] = [];
  let next = 0;
  await Promise.all(
    Array.from({ length: workerCount }, () => {
      const worker = new Worker(bootstrap, { eval: true });
      return new Promise<void>((resolve, reject) => {
        const send = () => {
          if (next >= chunks.length) {
            void worker.terminate().then(() => resolve());
            return;
          }
          worker.postMessage(chunks[next]);
          next += 1;
        };
        worker.on('message', (result: ChunkResult) => {
          results.push(result);
          send();
        });
        worker.once('error', reject);
        send();
      });
    }),
  );
  return results.sort((x, y) => x.first - y.first);
}

async function main(): Promise<void> {
  console.log(`reference loop: ${referenceLoopNs().toFixed(2)} ns per iteration (lower is a faster stretch)`);
  const t0 = performance.now();
  const scene = buildScene();
  const sceneMs = performance.now() - t0;
  let shadowFree = 0;
  for (let t = 0; t < scene.triangleCount; t += 1) if (scene.unshadowable[t] !== 0) shadowFree += 1;
  console.log(
    `box-wing mesh: ${scene.triangleCount} triangles; scene (optics, BVH of ${scene.bvh.nodes.length / 2} nodes, pre-pass) ` +
      `built in ${sceneMs.toFixed(0)} ms; ${shadowFree} facets have a side nothing can shade`,
  );

  const { polarCount, azimuthCount } = coefficientTableShape(SETTINGS.stepDeg);
  const directions = (polarCount - 2) * azimuthCount + 2; // each pole computed once
  const t1 = performance.now();
  const cpu1 = process.cpuUsage();
  const single = computeCoefficientTableRows(scene, SETTINGS, 0, polarCount);
  const singleMs = performance.now() - t1;
  const cpu = process.cpuUsage(cpu1);
  // CPU time beside wall time: on this shared machine other processes stretch the wall time.
  const cpuMs = (cpu.user + cpu.system) / 1000;
  console.log(
    `5° table (${polarCount} × ${azimuthCount} nodes, ${directions} distinct directions), ${SETTINGS.samplesPerFacet} samples per facet, one core: ` +
      `${(singleMs / 1000).toFixed(2)} s wall, ${(cpuMs / 1000).toFixed(2)} s CPU (target < 30 s: ${singleMs < 30_000 ? 'met' : 'NOT met'}); ` +
      `${(single.rays / 1e6).toFixed(1)} million rays and ${(single.sweeps / 1e6).toFixed(1)} million swept-prism tests ` +
      `(${((single.rays + single.sweeps) / (singleMs / 1000) / 1e6).toFixed(2)} million queries/s, ` +
      `${(single.rays / (singleMs / 1000) / 1e6).toFixed(2)} million rays/s)`,
  );

  // Two workers taking 8 chunks of rows in turn.
  const t2 = performance.now();
  const parts = await computeOnWorkers(polarCount, 8, 2);
  const pairMs = performance.now() - t2;
  const joined = assembleCoefficientTable(SETTINGS.stepDeg, parts.map((p) => p.values));
  let maxDiff = 0;
  for (let k = 0; k < joined.values.length; k += 1) maxDiff = Math.max(maxDiff, Math.abs(joined.values[k]! - single.values[k]!));
  const busyMs = parts.reduce((sum, p) => sum + p.ms, 0);
  console.log(
    `same table as 8 row chunks over 2 worker_threads: ${(pairMs / 1000).toFixed(2)} s wall, start-up and scene building included ` +
      `(chunks ${(busyMs / 1000).toFixed(2)} s of computing in all); speed-up ${(singleMs / pairMs).toFixed(2)}× on this 2-core machine ` +
      `(other processes share it: see the reference loop); joined table equals the single-core one: ${maxDiff === 0 ? 'yes' : `no (max diff ${maxDiff})`}`,
  );
  console.log(`reference loop after: ${referenceLoopNs().toFixed(2)} ns per iteration`);

  await compareShadowRays(scene);
}

/** Shadow rays from every facet centroid (lifted) towards a set of Sun directions, for facets facing the Sun. */
function rayBatch(scene: MeshScene, directions: number): { origins: Float64Array; dirs: Float64Array } {
  const origins: number[] = [];
  const dirs: number[] = [];
  const golden = Math.PI * (3 - Math.sqrt(5));
  // Lifted well above float32 rounding (the library stores positions in float32) so that neither
  // side hits the facet a ray leaves; the two then see the same blocked fraction.
  const lift = 1e-4 * scene.sizeM;
  for (let d = 0; d < directions; d += 1) {
    const z = 1 - (2 * (d + 0.5)) / directions;
    const r = Math.sqrt(1 - z * z);
    const s = [r * Math.cos(golden * d), r * Math.sin(golden * d), z] as const;
    for (let t = 0; t < scene.triangleCount; t += 1) {
      const nx = scene.normal[3 * t]!;
      const ny = scene.normal[3 * t + 1]!;
      const nz = scene.normal[3 * t + 2]!;
      const cos = nx * s[0] + ny * s[1] + nz * s[2];
      if (cos <= 0) continue;
      for (let k = 0; k < 3; k += 1) origins.push(scene.centroid[3 * t + k]! + lift * scene.normal[3 * t + k]!);
      dirs.push(s[0], s[1], s[2]);
    }
  }
  return { origins: Float64Array.from(origins), dirs: Float64Array.from(dirs) };
}

interface Vector3Subset {
  set(x: number, y: number, z: number): Vector3Subset;
}
interface ThreeSubset {
  BufferGeometry: new () => { setAttribute(name: string, attribute: unknown): void };
  BufferAttribute: new (array: Float32Array, itemSize: number) => unknown;
  Vector3: new () => Vector3Subset;
  Ray: new (origin: Vector3Subset, direction: Vector3Subset) => { origin: Vector3Subset; direction: Vector3Subset };
  DoubleSide: number;
}
interface MeshBvhSubset {
  MeshBVH: new (geometry: unknown) => { raycastFirst(ray: unknown, side: number): unknown };
}

async function compareShadowRays(scene: MeshScene): Promise<void> {
  const { origins, dirs } = rayBatch(scene, 64);
  const count = origins.length / 3;
  const ray = createMeshRay();
  ray[6] = Infinity;
  let ownBest = 0;
  let ownHits = 0;
  for (let round = 0; round < 3; round += 1) {
    let hits = 0;
    const t0 = performance.now();
    for (let i = 0; i < count; i += 1) {
      ray[0] = origins[3 * i]!;
      ray[1] = origins[3 * i + 1]!;
      ray[2] = origins[3 * i + 2]!;
      ray[3] = dirs[3 * i]!;
      ray[4] = dirs[3 * i + 1]!;
      ray[5] = dirs[3 * i + 2]!;
      if (anyHit(scene.bvh, ray, -1)) hits += 1;
    }
    ownBest = Math.max(ownBest, count / ((performance.now() - t0) / 1000));
    ownHits = hits;
  }
  console.log(
    `shadow rays (any hit), ${count} rays from facet centroids over 64 Sun directions: own flat BVH ` +
      `${(ownBest / 1e6).toFixed(2)} million rays/s (${((100 * ownHits) / count).toFixed(1)} % blocked)`,
  );

  // three-mesh-bvh, when installed (a devDependency for this comparison only; never in src).
  // `three` ships no type declarations (and @types/three is not installed): the few members used
  // are typed here, and the specifiers are variables so that tsc does not look for the packages.
  const threeName = 'three';
  const meshBvhName = 'three-mesh-bvh';
  let three: ThreeSubset;
  let meshBvh: MeshBvhSubset;
  try {
    three = (await import(threeName)) as ThreeSubset;
    meshBvh = (await import(meshBvhName)) as MeshBvhSubset;
  } catch {
    console.log('three-mesh-bvh: not installed, comparison skipped');
    return;
  }
  const geometry = new three.BufferGeometry();
  geometry.setAttribute('position', new three.BufferAttribute(Float32Array.from(scene.positions), 3));
  const t0 = performance.now();
  const bvh = new meshBvh.MeshBVH(geometry);
  const buildMs = performance.now() - t0;
  const libRay = new three.Ray(new three.Vector3(), new three.Vector3());
  let libBest = 0;
  let libHits = 0;
  for (let round = 0; round < 3; round += 1) {
    let hits = 0;
    const t1 = performance.now();
    for (let i = 0; i < count; i += 1) {
      libRay.origin.set(origins[3 * i]!, origins[3 * i + 1]!, origins[3 * i + 2]!);
      libRay.direction.set(dirs[3 * i]!, dirs[3 * i + 1]!, dirs[3 * i + 2]!);
      // firstHitOnly is the library's fastest query; it finds the nearest hit, there is no any-hit.
      if (bvh.raycastFirst(libRay, three.DoubleSide) !== null) hits += 1;
    }
    libBest = Math.max(libBest, count / ((performance.now() - t1) / 1000));
    libHits = hits;
  }
  console.log(
    `three-mesh-bvh 0.8.3 (raycastFirst, double-sided, float32 positions): ${(libBest / 1e6).toFixed(2)} million rays/s ` +
      `(${((100 * libHits) / count).toFixed(1)} % blocked; BVH built in ${buildMs.toFixed(0)} ms); own BVH ${(ownBest / libBest).toFixed(2)}× its rate`,
  );
}
