/** For `register(name, { setValueAs })`: a select's empty choice ('') stands for null in the contract. */
export const emptyToNull = (value: unknown) => (value === '' ? null : value);
