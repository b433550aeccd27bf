/** A number with the reason it is what it is, in a few words the screen can show beside it. */
export interface Explained<T = number> {
  value: T;
  why: string;
}

/** Pairs a value with its reason. */
export function explain<T>(value: T, why: string): Explained<T> {
  return { value, why };
}
