// Stable ids for what the stock notes are about: a part of the cut list by its
// name (`part.felloe-piece`), a species' stock (`stock.white-ash`) and one
// listed section of it (`stock.white-ash.75x75`).

const slug = (name: string) => name.toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '');

export const partSubject = (part: string) => `part.${slug(part)}`;

export const speciesSubject = (species: string) => `stock.${species}`;

export const sectionSubject = (species: string, s: { width_mm: number; thickness_mm: number }) => `stock.${species}.${s.width_mm}x${s.thickness_mm}`;
