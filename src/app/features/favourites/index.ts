// This area is reached only through its routes (favourites.routes.ts); nothing else is given out.
export {};
