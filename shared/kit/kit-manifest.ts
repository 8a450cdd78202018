import { z } from 'zod';
import { kitRequestSchema } from '../schemas/kit-request';

const vec3 = z.tuple([z.number(), z.number(), z.number()]);

/** One file of a kit, as the manifest lists it. */
export const kitPartSchema = z.object({
  /** File name inside the kit, e.g. "pocket-cutter-A.stl". */
  file: z.string(),
  /** key: a loose part to print; pocket-cutter / slot-cutter: subtract from a half; rail: join onto half A. */
  role: z.enum(['key', 'pocket-cutter', 'rail', 'slot-cutter']),
  /** The half of the user's model the file belongs to: A below the cut face (z ≤ 0), B above. */
  half: z.enum(['A', 'B']).optional(),
  /** How many to print (keys), or 1 for a file that holds every pocket, rail or slot in place. */
  quantity: z.number().int(),
  triangles: z.number().int(),
  volumeMm3: z.number(),
  bbox: z.object({ min: vec3, max: vec3 }),
  /** Centres [x, y] in mm on the cut face of the pockets, rails or slots in the file. */
  positions: z.array(z.tuple([z.number(), z.number()])).optional(),
  /** What the file is and what to do with it, in plain words. */
  note: z.string(),
});
/** One file of a kit as the manifest lists it; see {@link kitPartSchema}. */
export type KitPart = z.infer<typeof kitPartSchema>;

/**
 * The kit's manifest.json and the reply of `POST /api/kits/summary`: the public contract of issue 3
 * (`units`, `clearancePerSide`, `keyScale`, `request`, `parts`, `warnings`) plus extras: the fit's
 * derivation, the coordinate frame, derived sizes and print notes. Lengths in mm, volumes in mm³.
 *
 * @example
 * kitManifestSchema.parse(await (await fetch('/api/kits/summary', { method: 'POST', body })).json());
 */
export const kitManifestSchema = z.object({
  units: z.literal('mm'),
  /** Gap per side between key and pocket (or rail and slot), mm; with strategy "scale", what the scale leaves. */
  clearancePerSide: z.number(),
  /** Print scale of the keys with strategy "scale" (0.99 = 99 %); absent otherwise. */
  keyScale: z.number().optional(),
  /** The request with every default applied. */
  request: kitRequestSchema,
  parts: z.array(kitPartSchema),
  warnings: z.array(z.string()),
  /** How the clearance was chosen, in words and as steps that add up to it. */
  fit: z.object({
    derivation: z.string(),
    steps: z.array(z.object({ label: z.string(), mm: z.number(), source: z.string() })),
  }),
  /** The coordinate frame of every file, in words. */
  frame: z.string(),
  /** Sizes that follow from the request, in mm (or degrees where named so). */
  derived: z.record(z.string(), z.number()),
  printNotes: z.array(z.string()),
});
/** A kit's manifest.json; see {@link kitManifestSchema}. */
export type KitManifest = z.infer<typeof kitManifestSchema>;
