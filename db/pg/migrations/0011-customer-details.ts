/** PostgreSQL twin of 0011: a customer's contact, postal address and payment terms. */
export const version0011 = `
  ALTER TABLE customers ADD COLUMN contact text NOT NULL DEFAULT '';
  ALTER TABLE customers ADD COLUMN address text NOT NULL DEFAULT '';
  ALTER TABLE customers ADD COLUMN payment_terms text NOT NULL DEFAULT '';
`;
