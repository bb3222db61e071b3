// The notebooks area's public face: the notebooks about one book, for its page.
export { BookNotebooks } from './book-notebooks/book-notebooks';
