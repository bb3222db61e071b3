// This area is reached only through its routes (goals.routes.ts); nothing else is given out.
export {};
