// The library's public face: how the library finds books (the labels page's spec checks its filter).
export { queryLibrary, searchText, type LibraryQuery } from './library-query';
// The book form's model: the catalogue's offer on the book page writes through it.
export { changedFields, toFormValue, type BookFormValue } from './book-editor/book-form-model';
