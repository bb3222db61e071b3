// This area is reached only through its routes (labels.routes.ts); nothing else is given out.
export {};
