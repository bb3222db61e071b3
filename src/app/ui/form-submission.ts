import { signal } from '@angular/core';
import type { FormGroup } from '@angular/forms';

import { readableError } from '../core/http/api-error-message';
import { showServerErrors } from './field-errors';

/**
 * The send-a-form routine of the account pages: validate, show progress, and on failure put
 * the server's message on the page and its per-field reasons under the fields.
 */
export class FormSubmission {
  /** A request is under way. */
  readonly busy = signal(false);
  /** The last failure's message, for a `role="alert"` line. */
  readonly problem = signal('');

  /** Runs `send` when the form is valid; resolves whether it succeeded. */
  async submit(form: FormGroup, send: () => Promise<unknown>): Promise<boolean> {
    form.markAllAsTouched();
    if (form.invalid || this.busy()) return false;
    this.busy.set(true);
    this.problem.set('');
    try {
      await send();
      return true;
    } catch (error) {
      const readable = readableError(error);
      this.problem.set(readable.message);
      showServerErrors(form, readable.fields);
      return false;
    } finally {
      this.busy.set(false);
    }
  }
}
