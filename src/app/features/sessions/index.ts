// The sessions area's public face: a book's reading block and its finish forecast.
export { BookReading } from './book-reading/book-reading';
export { bookForecast, bookProgress, type BookForecast, type BookProgress } from './book-forecast';
