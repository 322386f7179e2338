/** The name a statement's PDF is saved under. */
export const statementFileName = (reference: string) => `Statement ${reference}.pdf`;

/** Where the venue's staff see a statement and pay it online. */
export const statementPayUrl = (appUrl: string, id: number) => `${appUrl}/venue/statements/${id}`;
