// The catalogue feature's door: book details from library catalogues, for the book editor and
// the book page. Everything else in this folder is private to it.
export { CatalogueFill } from './catalogue-fill/catalogue-fill';
export { CatalogueOffer } from './catalogue-offer/catalogue-offer';
export { CatalogueSearch } from './catalogue-search/catalogue-search';
export type { FillInResult } from './fill-in-dialog/fill-in-dialog';
export { FILLABLE_FIELDS, type FillValues } from './fill-values';
export { PendingLookups } from './pending-lookups';
