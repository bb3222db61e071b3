// The quotes area's public face: capturing a quote from anywhere, and a book's quotes.
export { QuoteCapture } from './quote-capture';
export { BookQuotes } from './book-quotes/book-quotes';
