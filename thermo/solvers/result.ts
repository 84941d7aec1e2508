/** What every iterative solver reports about itself. */
export interface SolverReport {
  converged: boolean;
  iterations: number;
  /** Final residual in the solver's own measure (stated in each solver's docblock). */
  residual: number;
  /** Why it stopped: 'converged', 'max-iterations', 'no-bracket', 'trivial-solution', ... */
  reason: string;
}
