// Child process of the benchmark: runs the worker's own index and proxy code on one local file and
// reports the times and this process's peak memory as JSON on stdout.
import { summarizeIndex, encodePts } from "../../lib/clips/rules";
import { proxyGop } from "../../lib/clips/proxy-rules";
import { probePacketTimes } from "../../lib/video/ffprobe-packets";
import { buildProxy } from "../../lib/video/proxy";

async function main() {
  const [file, proxyOut, skipProxy] = process.argv.slice(2);
  const t0 = performance.now();
  const packets = await probePacketTimes(file);
  const pts = packets.pts.map(Number);
  const summary = summarizeIndex(pts, packets.timeBase, packets.keyframes);
  const stored = encodePts(pts);
  const indexMs = performance.now() - t0;
  let proxyMs: number | null = null;
  if (skipProxy !== "skip-proxy") {
    const t1 = performance.now();
    await buildProxy(file, proxyOut, { timescale: packets.timeBase.den, gop: proxyGop(summary.averageRate) });
    proxyMs = performance.now() - t1;
  }
  // maxRSS is in kilobytes on Linux.
  console.log(JSON.stringify({ indexMs, proxyMs, frames: summary.frameCount, storedBytes: stored.length, gop: proxyGop(summary.averageRate), timescale: packets.timeBase.den, peakRssMb: process.resourceUsage().maxRSS / 1024 }));
}

main().catch((err) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
