// The admin pages are reached only through their routes (admin.routes.ts); nothing else is given out.
export {};
