/**
 * The cautions every kit and coupon README carries, one line each under a heading: fumes and skin contact
 * of glues, solvents and resin; sanding dust; and the maker's responsibility for load-bearing parts.
 *
 * @returns the lines of the CAUTIONS section
 * @example
 * kitCautions()[0]; // 'CAUTIONS'
 */
export function kitCautions(): string[] {
  return [
    'CAUTIONS',
    '- Glues, solvents and uncured resin give off fumes and irritate skin and eyes: work with good ventilation, wear gloves and eye protection, and follow the safety data sheet of each product.',
    '- Sanding and cutting printed parts makes fine dust: wear a dust mask and ventilate the room.',
    '- Joints in load-bearing or safety-critical parts must be tested under real loads before use. Whether a joint is fit for its purpose is the responsibility of the person who makes it; where local codes or regulations apply, follow them.',
  ];
}
