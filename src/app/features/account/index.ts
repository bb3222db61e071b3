// The account area's public face: the sign-out flow the shell and settings offer.
export { SignOutFlow } from './sign-out/sign-out-flow';
