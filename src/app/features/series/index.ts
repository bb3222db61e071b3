// This area is reached only through its routes (series.routes.ts); nothing else is given out.
export {};
