export async function runGridCommand(_args: string[]): Promise<number> { process.stderr.write('grid: not built yet\n'); return 2; }
