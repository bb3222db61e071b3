// The settings page is reached only through its routes (settings.routes.ts); nothing else is given out.
export {};
