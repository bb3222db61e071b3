// This area is reached only through its routes (circles.routes.ts); nothing else is given out.
export {};
