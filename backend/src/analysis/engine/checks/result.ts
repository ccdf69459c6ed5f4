/** A code check's outcome: the values, whether it passes, and the clause it follows. */
export interface CheckResult<T> {
  value: T;
  pass: boolean;
  clause: string;
}
