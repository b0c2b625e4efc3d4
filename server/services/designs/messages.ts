/** Sentences the design services answer with; a missing and a foreign design read exactly the same (docs/api.md). */
export const NO_SUCH_DESIGN = 'There is no such design in your team.';

export function noSuchVersion(number: number): string {
  return `This design has no version ${number}.`;
}

export const DEFAULT_FIRST_MESSAGE = 'First version';
