// The loans area's public face: the book page's loans section, Today's card and the Settings panel
// (the two with forms are deferred wrappers, so Today's card does not bring their forms along).
export { BookLoansSection } from './deferred-panels';
export { LoansToday } from './loans-today/loans-today';
export { LoanSettingsSection } from './deferred-panels';
