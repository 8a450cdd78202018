// The demo data is an invented scenario: a small prop studio that splits large costume and
// display pieces across two printers. No real company, person or product is named.
export const demoStudio = {
  slug: 'quillmoss',
  name: 'Quillmoss Prop Studio',
  tagline: 'Helmets, shields and display bases for stage and conventions, printed in parts.',
} as const;
