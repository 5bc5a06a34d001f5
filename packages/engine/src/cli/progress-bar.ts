/**
 * A one-line progress bar on stderr, only when stderr is a terminal (so piped or logged
 * output never holds control characters). Returns undefined when there is no terminal.
 */
export function progressBar(stream: NodeJS.WriteStream = process.stderr): ((fraction: number) => void) | undefined {
  if (!stream.isTTY) return undefined;
  let shown = -1;
  return (fraction) => {
    const percent = Math.floor(fraction * 100);
    if (percent === shown) return;
    shown = percent;
    const width = 30;
    const filled = Math.round((percent / 100) * width);
    stream.write(`\r[${"#".repeat(filled)}${".".repeat(width - filled)}] ${percent}%`);
    if (percent >= 100) stream.write("\r\x1b[K");
  };
}
