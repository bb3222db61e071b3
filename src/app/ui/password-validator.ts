import type { AbstractControl, ValidationErrors, ValidatorFn } from '@angular/forms';

import { checkPassword, type PasswordContext } from '@shared/account/password-policy';

/** The shared password policy (NIST SP 800-63B-4) as a form validator: `{ password: reason }`. */
export function passwordPolicy(context: () => PasswordContext = () => ({})): ValidatorFn {
  return (control: AbstractControl<string>): ValidationErrors | null => {
    if (!control.value) return null; // `required` speaks for an empty field
    const problem = checkPassword(control.value, context());
    return problem ? { password: problem } : null;
  };
}
