/**
 * `correlary withdraw <slug> --reason TEXT [--replaced-by SLUG] [--date YYYY-MM-DD] [--content DIR]`: mark a
 * correlation withdrawn. It stays published, with a banner giving the reason and linking to its replacement.
 * Writes status, withdrawnReason, withdrawnDate and replacedBy into the review block and changes nothing else (an
 * earlier approval record stays, for the history). Refuses, changing nothing, when `check` reports an error for
 * the correlation, or when the replacement is not another correlation of the handbook or is itself withdrawn.
 */
import { CliError } from './cliError.ts';
import { checkedCorrelation, dateOption, parseReviewArgs, writeReview } from './reviewCommand.ts';

const USAGE = `usage: correlary withdraw <slug> --reason TEXT [--replaced-by SLUG] [--date YYYY-MM-DD] [--content DIR]
  marks the correlation withdrawn (it stays published with a banner naming the reason and the replacement):
  writes review.status withdrawn, withdrawnReason, withdrawnDate (default today) and replacedBy into
  <DIR>/<slug>/correlation.yaml (DIR defaults to content); nothing else in the file changes.`;

export async function runWithdraw(args: string[]): Promise<number> {
  if (args.includes('-h') || args.includes('--help')) {
    console.log(USAGE);
    return 0;
  }
  const parsed = parseReviewArgs('withdraw', args, ['reason', 'replaced-by', 'date', 'content'], USAGE);
  const reason = parsed.options.get('reason');
  if (reason === undefined) throw new CliError(`withdraw needs --reason TEXT (why it must not be used)\n${USAGE}`, 2);
  const replacedBy = parsed.options.get('replaced-by');
  const date = dateOption(parsed.options.get('date'));
  const { handbook, found } = await checkedCorrelation('withdraw', parsed);
  if (replacedBy !== undefined) {
    const replacement = handbook.datasets.find((dataset) => dataset.dataset.slug === replacedBy);
    if (replacedBy === parsed.slug) throw new CliError(`withdraw refused: --replaced-by names ${parsed.slug} itself; nothing was changed`);
    if (replacement === undefined) throw new CliError(`withdraw refused: --replaced-by '${replacedBy}' is not a correlation in ${parsed.content}; nothing was changed`);
    if (replacement.dataset.correlation?.meta.review.status === 'withdrawn') {
      throw new CliError(`withdraw refused: the replacement '${replacedBy}' is itself withdrawn; nothing was changed`);
    }
  }
  const set = { status: 'withdrawn', withdrawnReason: reason, withdrawnDate: date, ...(replacedBy === undefined ? {} : { replacedBy }) };
  const file = await writeReview(found, set, replacedBy === undefined ? ['replacedBy'] : []);
  console.log(`withdrew ${parsed.slug} on ${date}${replacedBy === undefined ? '' : `, replaced by ${replacedBy}`}: ${reason}`);
  console.log(`wrote the review block of ${file}; the page stays published with a withdrawal banner`);
  return 0;
}
