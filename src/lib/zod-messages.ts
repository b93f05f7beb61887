import { z } from 'zod';

/**
 * Plain-language messages for the shared schemas' generic checks, on the client
 * only. A message written into a schema (e.g. the mark pattern) still wins.
 */
export function installFormMessages(): void {
  z.config({
    customError: (issue) => {
      switch (issue.code) {
        case 'too_small':
          if (issue.origin === 'string') return Number(issue.minimum) <= 1 ? 'Required' : `At least ${issue.minimum} characters`;
          if (issue.origin === 'number') return `${issue.inclusive ? 'At least' : 'More than'} ${issue.minimum}`;
          return undefined;
        case 'too_big':
          if (issue.origin === 'string') return `At most ${issue.maximum} characters`;
          if (issue.origin === 'number') return `${issue.inclusive ? 'At most' : 'Less than'} ${issue.maximum}`;
          return undefined;
        case 'invalid_type':
          return issue.expected === 'number' ? 'Enter a number' : 'Required';
        case 'invalid_format':
          return issue.format === 'email' ? 'Enter an e-mail address, e.g. name@shop.example' : undefined;
        case 'invalid_value':
          return 'Choose one of the options';
        default:
          return undefined;
      }
    },
  });
}
