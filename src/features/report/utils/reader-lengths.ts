/**
 * Lengths written into the server's labels ("Centre irradiance at 15 cm") in the reader's length
 * unit. Only "<number> cm" is rewritten; areas (cm²) and everything else are left alone.
 */
export function withReaderLengths(text: string, formatLength: (cm: number) => string): string {
  return text.replace(/(-?\d+(?:\.\d+)?) cm(?![²\w])/g, (_m, n: string) => formatLength(Number(n)));
}
