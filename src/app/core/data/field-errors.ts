/** A local write refused before it touched the database, with a reason per field. */
export class InvalidFieldsError extends Error {
  constructor(readonly fields: Readonly<Record<string, string>>) {
    super(
      `Some fields need attention: ${Object.entries(fields)
        .map(([field, reason]) => `${field} ${reason}`)
        .join('; ')}`,
    );
    this.name = 'InvalidFieldsError';
  }
}
