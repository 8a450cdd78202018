import type { ResolvedKitRequest } from '../../../../shared/schemas/kit-request';

/** One caution: a short title and what to do, in plain words. */
export interface Caution {
  readonly id: string;
  readonly title: string;
  readonly text: string;
}

/**
 * The safety cautions that apply to a kit: resin handling, printing fumes, glue and solvent fumes, sanding
 * dust, small parts and magnets near children, and who answers for load-bearing parts (always shown).
 *
 * @param request - the resolved kit request
 * @returns cautions, most specific first
 * @example
 * cautionsFor(request).map((c) => c.id); // ['glue', 'sanding', 'small-parts', 'load']
 */
export function cautionsFor(request: ResolvedKitRequest): Caution[] {
  const list: Caution[] = [];
  if (request.process === 'resin') {
    list.push({
      id: 'resin',
      title: 'Liquid resin',
      text: 'Uncured resin irritates skin and eyes and can sensitise you over time. Wear nitrile gloves and eye protection, ventilate the room, and cure parts fully before handling them bare-handed.',
    });
  }
  if (request.material === 'ABS' || request.material === 'ASA') {
    list.push({
      id: 'fumes',
      title: 'Printing fumes',
      text: `${request.material} gives off fumes and fine particles while it prints. Print in an enclosure or a ventilated room, away from where people sleep or eat.`,
    });
  }
  if (request.fit !== 'slide') {
    list.push({
      id: 'glue',
      title: 'Glue and solvents',
      text: 'Cyanoacrylate, epoxy and solvent welding give off fumes and bond skin. Work with ventilation, wear gloves and eye protection, and keep solvents away from flames.',
    });
  }
  list.push({
    id: 'sanding',
    title: 'Sanding dust',
    text: 'If a key or rail needs sanding to fit, the dust is fine plastic. Sand wet or wear a dust mask, and clean up with a damp cloth rather than a brush.',
  });
  if (request.joint === 'key') {
    list.push({
      id: 'small-parts',
      title: 'Small parts and magnets',
      text: 'Loose keys, and any magnets you add to a joint, are small enough to swallow. Keep them away from young children and pets; swallowed magnets can do serious harm.',
    });
  }
  list.push({
    id: 'load',
    title: 'Strength is yours to check',
    text: 'Seamwright sizes the fit; it does not rate strength. Whether a joined part can carry a load or a person’s weight is the maker’s responsibility: test it before you rely on it.',
  });
  return list;
}
