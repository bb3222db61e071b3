// The loans area's public face: the book page's loans section, Today's card and the Settings panel.
export { BookLoans } from './book-loans/book-loans';
export { LoansToday } from './loans-today/loans-today';
export { LoanSettings } from './loan-settings/loan-settings';
