// The page for an address that leads nowhere (the router's last route).
export { NotFound } from './not-found';
