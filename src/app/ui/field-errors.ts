import type { AbstractControl, FormGroup, ValidationErrors } from '@angular/forms';

/**
 * With `Validators.required` (which draws the field's required marker): a value of spaces alone
 * is blank too, since it is saved trimmed.
 */
export function notBlank(control: AbstractControl<string | null>): ValidationErrors | null {
  return (control.value ?? '').trim() ? null : { required: true };
}

/** The message to show under a field for its first error, in the reader's words. */
export function fieldError(control: AbstractControl | null, label: string): string {
  const errors = control?.errors;
  if (!errors) return '';
  if (errors['required']) return `${label} is required`;
  if (errors['email']) return 'Enter an e-mail address like name@example.com';
  if (typeof errors['password'] === 'string') return errors['password'];
  if (typeof errors['server'] === 'string') return errors['server'];
  if (errors['maxlength']) return `Use at most ${errors['maxlength'].requiredLength} characters`;
  if (errors['mismatch']) return 'The two passwords differ';
  return `${label} is not valid`;
}

/** Puts the server's per-field reasons (`details`) onto the matching controls. */
export function showServerErrors(form: FormGroup, fields: Readonly<Record<string, string>>): void {
  for (const [name, message] of Object.entries(fields)) {
    const control = form.get(name);
    if (!control) continue;
    control.setErrors({ ...control.errors, server: message });
    control.markAsTouched();
  }
}
