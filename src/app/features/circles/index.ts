// This area is reached through its routes (circles.routes.ts); it gives out only its store, so a
// merge of two books (features/your-data) can move a circle's link to the kept book.
export { CircleStore } from './data/circle-store';
