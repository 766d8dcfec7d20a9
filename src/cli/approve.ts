/**
 * `correlary approve <slug> --by NAME [--date YYYY-MM-DD] [--content DIR]`: record an approval bound to the
 * correlation's current fingerprint. Writes status, reviewer, date and fingerprint into the review block of its
 * correlation.yaml and changes nothing else in the file (a withdrawal record, if any, is removed). Refuses, changing
 * nothing, when `check` reports an error for that correlation. Exit status 0 done, 1 refused, 2 bad usage.
 */
import { CliError } from './cliError.ts';
import { checkedCorrelation, dateOption, parseReviewArgs, writeReview } from './reviewCommand.ts';

const USAGE = `usage: correlary approve <slug> --by NAME [--date YYYY-MM-DD] [--content DIR]
  records that NAME approved the correlation as it is now: writes review.status approved, reviewer, date
  (default today) and the current fingerprint into <DIR>/<slug>/correlation.yaml (DIR defaults to content);
  nothing else in the file changes. Refused while 'correlary check' reports an error for the correlation.`;

export async function runApprove(args: string[]): Promise<number> {
  if (args.includes('-h') || args.includes('--help')) {
    console.log(USAGE);
    return 0;
  }
  const parsed = parseReviewArgs('approve', args, ['by', 'date', 'content'], USAGE);
  const reviewer = parsed.options.get('by');
  if (reviewer === undefined) throw new CliError(`approve needs --by NAME (who approves)\n${USAGE}`, 2);
  const date = dateOption(parsed.options.get('date'));
  const { found } = await checkedCorrelation('approve', parsed);
  const fingerprint = found.review!.fingerprint!.text;
  const file = await writeReview(found, { status: 'approved', reviewer, date, fingerprint }, ['withdrawnReason', 'withdrawnDate', 'replacedBy']);
  console.log(`approved ${parsed.slug}: reviewer ${reviewer}, ${date}, fingerprint ${fingerprint}`);
  console.log(`wrote the review block of ${file}; any later change to its data, options or result lets this approval lapse`);
  return 0;
}
