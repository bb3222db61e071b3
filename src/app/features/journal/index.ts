// The journal hub is reached only through its routes (journal.routes.ts); nothing else is given out.
export {};
