/** The revision after `revision`: A → B, Z → AA, AZ → BA; undefined after ZZ. */
export function nextRevision(revision: string): string | undefined {
  const letters = [...revision];
  for (let i = letters.length - 1; i >= 0; i -= 1) {
    if (letters[i] !== 'Z') {
      letters[i] = String.fromCharCode(letters[i]!.charCodeAt(0) + 1);
      return letters.join('');
    }
    letters[i] = 'A';
  }
  return letters.length < 2 ? `A${letters.join('')}` : undefined;
}

/** The latest of several revisions of one part number: Z comes before AA. */
export function latestRevision<T extends { revision: string }>(revisions: T[]): T | undefined {
  return revisions.reduce<T | undefined>(
    (latest, r) => (!latest || compareRevisions(r.revision, latest.revision) > 0 ? r : latest),
    undefined,
  );
}

function compareRevisions(a: string, b: string): number {
  return a.length - b.length || a.localeCompare(b);
}
