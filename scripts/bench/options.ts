/**
 * Command-line options of the bench scripts: `--name value` or `--name=value`.
 * @example benchOption(['--count', '1000'], 'count', '100') // => '1000'
 */
export function benchOption(argv: readonly string[], name: string, fallback: string): string {
  const at = argv.findIndex((arg) => arg === `--${name}` || arg.startsWith(`--${name}=`));
  if (at < 0) return fallback;
  const arg = argv[at]!;
  return arg.includes('=') ? arg.slice(arg.indexOf('=') + 1) : (argv[at + 1] ?? fallback);
}
