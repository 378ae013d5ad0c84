// Child process of the benchmark: runs the worker's own code for one step on one local file and
// reports its time and this process's peak memory as JSON on stdout.
import { encodePts } from "../../lib/frame-index/pts-codec";
import { summarizeIndex } from "../../lib/frame-index/summary";
import { proxyGop } from "../../lib/clips/proxy-rules";
import { probePacketTimes } from "../../lib/frame-index/packets";
import { buildProxy } from "../../lib/video/proxy";

async function main() {
  const [step, file, proxyOut] = process.argv.slice(2);
  const t0 = performance.now();
  const packets = await probePacketTimes(file);
  const pts = packets.pts.map(Number);
  const summary = summarizeIndex(pts, packets.timeBase, packets.keyframes);
  const stored = encodePts(pts);
  const indexMs = performance.now() - t0;
  const gop = proxyGop(summary.averageRate);
  let proxyMs: number | null = null;
  if (step === "proxy") {
    const t1 = performance.now();
    await buildProxy(file, proxyOut, { timescale: packets.timeBase.den, gop });
    proxyMs = performance.now() - t1;
  }
  // maxRSS is in kilobytes on Linux.
  console.log(
    JSON.stringify({
      indexMs,
      proxyMs,
      frames: summary.frameCount,
      storedBytes: stored.length,
      gop,
      timescale: packets.timeBase.den,
      peakRssMb: process.resourceUsage().maxRSS / 1024,
    }),
  );
}

main().catch((err) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
