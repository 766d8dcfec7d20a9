/**
 * The `correlary` command line: dispatches to `fit`, `check`, `new`, `approve`, `withdraw` and `build`. User errors print one line and no stack
 * trace; the exit status is 0 on success, 1 on bad data, 2 on bad usage.
 */
import { CliError } from './cliError.ts';

const USAGE = `usage: correlary <command> [options]

commands:
  fit <file.csv>   fit one table and report the correlation (--json for machine-readable output)
  check [DIR]      validate and fit every correlation in a handbook folder (default: content)
  new <slug>       create a commented template for a new correlation
  approve <slug>   record an approval bound to the correlation's current fingerprint (--by NAME)
  withdraw <slug>  mark a correlation withdrawn, naming the reason and its replacement (--reason TEXT)
  build            build a handbook folder into a static site (--content DIR, --out DIR, --base PATH)`;

export async function main(args: readonly string[]): Promise<number> {
  const [command, ...rest] = args;
  try {
    switch (command) {
      case 'fit': {
        const { runFit } = await import('./fit.ts');
        return await runFit(rest);
      }
      case 'check': {
        const { runCheck } = await import('./check.ts');
        return await runCheck(rest);
      }
      case 'new': {
        const { runNew } = await import('./new.ts');
        return await runNew(rest);
      }
      case 'approve': {
        const { runApprove } = await import('./approve.ts');
        return await runApprove(rest);
      }
      case 'withdraw': {
        const { runWithdraw } = await import('./withdraw.ts');
        return await runWithdraw(rest);
      }
      case 'build': {
        const { runBuild } = await import('./build.ts');
        return await runBuild(rest);
      }
      case undefined:
      case '-h':
      case '--help':
      case 'help':
        console.log(USAGE);
        return command === undefined ? 2 : 0;
      default:
        console.error(`correlary: unknown command '${command}'\n${USAGE}`);
        return 2;
    }
  } catch (error) {
    if (error instanceof CliError) {
      console.error(`correlary: ${error.message}`);
      return error.exitCode;
    }
    const message = error instanceof Error ? error.message : String(error);
    console.error(`correlary: internal error: ${message}`);
    return 1;
  }
}
