/** The five file kinds and their schemas. */
export { boatFile } from './boat.ts';
export { bookFile } from './book.ts';
export { engineFile } from './engine.ts';
export { jetFile } from './jet.ts';
export { siteFile } from './site.ts';
