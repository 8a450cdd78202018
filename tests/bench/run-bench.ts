// `npm run bench`: the speed targets of the joint engine, measured, not asserted (numbers go in notes).
// 1. For each reference kit: median build, STL and zip time with Seamwright's engine, and the same solids
//    built with manifold-3d (then the same STL writer and zip), with the ratio (target ≤ 1.5×).
// 2. Binary STL writing speed on a one-million-triangle mesh against a plain memory copy (target ≥ 2 GB/s).
import { Writable } from 'node:stream';
import os from 'node:os';
import { kitRequestSchema } from '../../shared/schemas/kit-request';
import { keyKitPlan } from '../../shared/kit/key-kit-plan';
import { dovetailKitPlan } from '../../shared/kit/dovetail-kit-plan';
import { geom3ToMesh, meshVolume, type TriangleMesh } from '../../shared/geometry/mesh';
import { binaryStlByteLength, writeBinaryStl } from '../../shared/geometry/stl';
import { writeZip } from '../../server/modules/kits/kit-zip';
import { referenceKits } from './reference-kits';
import { medianMs } from './timing';
import { convexComponents } from './convex-components';
import { buildPartWithManifold, loadManifold } from './manifold-build';
import { layoutOnly } from './layout-only';

const sink = () => new Writable({ write: (_chunk, _enc, done) => done() });
const fmt = (ms: number) => `${ms.toFixed(3)} ms`;

function buildMeshes(request: ReturnType<typeof kitRequestSchema.parse>): TriangleMesh[] {
  const plan = request.joint === 'key' ? keyKitPlan(request) : dovetailKitPlan(request);
  return plan.parts.map((part) => geom3ToMesh(part.solid));
}

const stlFiles = (meshes: TriangleMesh[]) =>
  meshes.map((mesh, i) => ({ name: `part-${i}.stl`, bytes: writeBinaryStl(mesh) }));

async function benchKit(name: string, body: unknown) {
  const request = kitRequestSchema.parse(body);
  const m = await loadManifold();
  const meshes = buildMeshes(request);
  const solids = meshes.map(convexComponents);
  const files = stlFiles(meshes);

  const build = await medianMs(() => buildMeshes(request));
  const stl = await medianMs(() => stlFiles(meshes));
  const zip = await medianMs(() => writeZip(files, sink()));
  const ours = await medianMs(() => writeZip(stlFiles(buildMeshes(request)), sink()));
  const layout = await medianMs(() => layoutOnly(request));
  const manifoldBuild = await medianMs(() => solids.map((s) => buildPartWithManifold(m, s).mesh));
  // The manifold-3d pipeline needs the same fit and positions to build the same solids: it runs the layout too.
  const theirs = await medianMs(() => {
    layoutOnly(request);
    return writeZip(stlFiles(solids.map((s) => buildPartWithManifold(m, s).mesh)), sink());
  });

  const volumes = meshes.map((mesh, i) => [meshVolume(mesh), buildPartWithManifold(m, solids[i]!).volume]);
  const worstVolume = Math.max(...volumes.map(([a, b]) => Math.abs(a! - b!) / b!));
  const triangles = meshes.reduce((n, mesh) => n + mesh.normals.length / 3, 0);
  console.log(`\n${name}  (${meshes.length} files, ${triangles} triangles)`);
  console.log(`  layout (fit + positions, run by both pipelines) ${fmt(layout)}`);
  console.log(
    `  Seamwright  build ${fmt(build)} (layout + solids) · STL ${fmt(stl)} · zip ${fmt(zip)} · end to end ${fmt(ours)}`,
  );
  console.log(
    `  manifold-3d solids ${fmt(manifoldBuild)} · end to end (same layout, STL writer and zip) ${fmt(theirs)}`,
  );
  console.log(
    `  ratio end to end ${(ours / theirs).toFixed(2)}× (target ≤ 1.5×) · volumes agree within ${(worstVolume * 100).toExponential(1)} %`,
  );
}

function syntheticMesh(triangles: number): TriangleMesh {
  const positions = new Float32Array(triangles * 9);
  const normals = new Float32Array(triangles * 3);
  // Deterministic values; the writer copies bits, so their meaning does not matter for speed.
  for (let i = 0; i < positions.length; i++) positions[i] = ((i * 2654435761) % 100000) / 1000;
  for (let i = 0; i < normals.length; i++) normals[i] = (i % 3) / 3;
  return { positions, normals };
}

async function benchStlWriter() {
  const triangles = 1_000_000;
  const mesh = syntheticMesh(triangles);
  const bytes = binaryStlByteLength(triangles);
  const target = new ArrayBuffer(bytes);
  const source = new Uint8Array(bytes).fill(7);
  const copyTarget = new Uint8Array(bytes);
  const write = await medianMs(() => writeBinaryStl(mesh, { target }), 21, 3);
  const copy = await medianMs(() => copyTarget.set(source), 21, 3);
  const gbps = (ms: number) => (bytes / (ms / 1000) / 1e9).toFixed(2);
  console.log(`\nBinary STL, ${triangles.toLocaleString('en')} triangles (${(bytes / 1e6).toFixed(1)} MB)`);
  console.log(
    `  writer ${fmt(write)} = ${gbps(write)} GB/s (target ≥ 2 GB/s) · memory copy ${fmt(copy)} = ${gbps(copy)} GB/s`,
  );
}

console.log(
  `Seamwright benchmark — Node ${process.version}, ${os.cpus().length} cores, ${os.cpus()[0]?.model ?? 'unknown CPU'}`,
);
console.log(
  'Medians of 41 runs after 5 warm-up runs. Zip level 1 (STL compresses about as well as at level 6, far faster).',
);
// A long-running server is warm: run every pipeline a while first so the JIT has compiled it.
for (const kit of referenceKits) {
  const request = kitRequestSchema.parse(kit.request);
  for (let i = 0; i < 100; i++) await writeZip(stlFiles(buildMeshes(request)), sink());
}
for (const kit of referenceKits) await benchKit(kit.name, kit.request);
await benchStlWriter();
