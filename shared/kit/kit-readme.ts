import { kitCautions } from './kit-cautions';
import type { KitManifest } from './kit-manifest';

const mm = (v: number) => `${Math.round(v * 1000) / 1000} mm`;

/**
 * The kit's README.txt: what to print and how many, which way up, the scale, how to glue, how to subtract
 * the cutters in any modelling program, the coordinate frame, and the cautions. Plain text, built only from
 * the manifest, so it never disagrees with it.
 *
 * @param manifest - the kit's manifest
 * @returns the README text, lines ending in "\n"
 * @example
 * kitReadme(manifest).split('\n')[0]; // "Seamwright joint kit: key pins and pockets"
 */
export function kitReadme(manifest: KitManifest): string {
  const isKey = manifest.request.joint === 'key';
  const sections = [
    [`Seamwright joint kit: ${isKey ? 'key pins and pockets' : 'sliding dovetail'}`, ''],
    filesSection(manifest),
    fitSection(manifest),
    ['PRINTING', ...manifest.printNotes.map((n) => `- ${n}`), ''],
    isKey ? assemblyKeys() : assemblyDovetail(),
    glueSection(manifest),
    ['COORDINATE FRAME', manifest.frame, ''],
    manifest.warnings.length ? ['WARNINGS', ...manifest.warnings.map((w) => `- ${w}`), ''] : [],
    kitCautions(),
  ];
  return `${sections.flat().join('\n')}\n`;
}

function filesSection(m: KitManifest): string[] {
  const lines = m.parts.map(
    (p) =>
      `- ${p.file}${p.half ? ` (half ${p.half})` : ''}: ${p.note}.${p.role === 'key' ? '' : ' Not a part to print on its own.'}`,
  );
  return ['FILES', ...lines, '- manifest.json: every number of this kit, for programs.', ''];
}

function fitSection(m: KitManifest): string[] {
  const lines = ['FIT', `Clearance per side: ${mm(m.clearancePerSide)}. ${m.fit.derivation}.`];
  if (m.keyScale !== undefined) {
    lines.push(
      `The pockets are at the key's nominal size and the key is scaled to ${Math.round(m.keyScale * 10000) / 100} % (already applied in key.stl), which leaves ${mm(m.clearancePerSide)} per side.`,
    );
  }
  lines.push(
    'Print one key and one pocket as a test before printing the whole model: the fit depends on your printer.',
    '',
  );
  return lines;
}

function assemblyKeys(): string[] {
  return [
    'SUBTRACTING THE POCKETS (any modelling program)',
    '1. Import your model and split it at the cut, or import its two halves, so the cut face lies in the plane z = 0 with half A below and half B above, centred where you entered the face (see COORDINATE FRAME).',
    '2. Import pocket-cutter-A.stl and pocket-cutter-B.stl without moving, scaling or rotating them; check the units are millimetres.',
    "3. With the program's boolean difference (also called subtract or cut), subtract pocket-cutter-A from half A and pocket-cutter-B from half B. Each cutter pokes 1 mm out of its half on purpose.",
    '4. Export each half, slice it and print it. Then push a key halfway into each pocket of one half, and join the other half onto the keys.',
    '',
  ];
}

function assemblyDovetail(): string[] {
  return [
    'JOINING THE RAILS AND SUBTRACTING THE SLOTS (any modelling program)',
    "1. Import your model's two halves so the cut face lies in the plane z = 0 with half A below and half B above (see COORDINATE FRAME).",
    '2. Import rail-A.stl and slot-cutter-B.stl without moving, scaling or rotating them; check the units are millimetres.',
    "3. With the program's boolean union (also called join, combine or add), join rail-A onto half A. With its boolean difference (subtract), subtract slot-cutter-B from half B; the cutter pokes 1 mm below the face and past the open ends on purpose.",
    '4. Export, slice and print both halves, then slide half B onto the rails of half A along y.',
    '',
  ];
}

function glueSection(m: KitManifest): string[] {
  const fit = m.request.fit;
  const advice =
    fit === 'slide'
      ? 'A slide fit is meant to come apart: do not glue it.'
      : fit === 'press'
        ? 'A press fit holds without glue; push parts home square, with steady force, and only glue if the joint must never open.'
        : 'A snug fit is meant to be glued: use an adhesive suited to your material (a two-part epoxy or a cyanoacrylate works for most filaments and resins). Put a thin film on the walls, not the bottom: the gap at each pocket end takes the excess. Clamp until the glue has set.';
  return ['GLUE', advice, ''];
}
