/** One problem in a reduction configuration, located by its field path. */
export interface ReductionConfigIssue {
  /** Dotted path of the field, e.g. `tunnel.sectionArea` or `balance.calibration.linear.2`. */
  path: string;
  message: string;
}

/** Thrown by `parseReductionConfig` with every problem found, each with its field path. */
export class ReductionConfigError extends Error {
  readonly code = 'CONFIG_INVALID';
  readonly issues: ReductionConfigIssue[];

  /**
   * @param issues - every problem found
   * @param source - file name (or description) of the configuration, for the message
   */
  constructor(issues: ReductionConfigIssue[], source = 'configuration') {
    super(`${source}: ${issues.map((issue) => `${issue.path || '(root)'}: ${issue.message}`).join('; ')}`);
    this.name = 'ReductionConfigError';
    this.issues = issues;
  }
}
