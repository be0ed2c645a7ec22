// Messages of the pipeline itself (not of a rule), with stable codes.
export const CORE_MESSAGES = {
  ruleFailed: { code: 2999, text: 'The rule {rule} could not run: {reason}.' },
} as const;
