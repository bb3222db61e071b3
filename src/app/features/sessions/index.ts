// The sessions area's public face: a book's reading block and its finish forecast.
export { BookReading } from './book-reading/book-reading';
// The forecast itself lives in core/read-model, so Today and the Library reach it without this area's components.
export { bookForecast, bookProgress, type BookForecast, type BookProgress } from '../../core/read-model/book-forecast';
