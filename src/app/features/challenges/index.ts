// This area is reached only through its routes (challenges.routes.ts); nothing else is given out.
export {};
