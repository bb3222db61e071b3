// The library's public face: how the library finds books (the labels page's spec checks its filter).
export { queryLibrary, searchText, type LibraryQuery } from './library-query';
