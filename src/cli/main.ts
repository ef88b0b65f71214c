export async function main(args: string[]): Promise<number> {
  process.stdout.write(`conecast ${args.join(' ')}\n`);
  return 0;
}
