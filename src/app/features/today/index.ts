// The today page is reached only through its routes (today.routes.ts); nothing else is given out.
export {};
