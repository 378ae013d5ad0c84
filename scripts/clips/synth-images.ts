import { BALL } from "./synth-plan";

// Still images the filter graph animates: the ball's surface and the drop's two layers. Computed
// here rather than with ffmpeg's geq, which evaluates its expressions ~20× slower (tens of
// seconds for one shaded 1080p frame, against well under one here). Pure: returns file contents
// (PPM / PAM, which ffmpeg reads natively).

const clamp255 = (v: number) => (v < 0 ? 0 : Math.min(v, 255));

/** Fixed per-pixel grain of the cover: static, so it moves with the ball when the camera shakes. */
function grain(x: number, y: number, seed: number): number {
  let h = Math.imul(x, 374761393) ^ Math.imul(y, 668265263) ^ Math.imul(seed, 2246822519);
  h = Math.imul(h ^ (h >>> 13), 1274126177);
  return ((h ^ (h >>> 16)) & 0xff) / 255 - 0.5;
}

/**
 * A warm reactive-resin cover filling most of the frame: a sphere lit from the upper left
 * (diffuse falloff, a tight specular highlight and a broad sheen), marbled in two tones, against
 * a dark backdrop. `margin` extra pixels on every side leave room for the camera shake's crop.
 */
export function surfacePpm(width: number, height: number, margin: number, seed: number): Buffer {
  const cw = width + 2 * margin;
  const ch = height + 2 * margin;
  const header = Buffer.from(`P6\n${cw} ${ch}\n255\n`, "ascii");
  const px = Buffer.alloc(cw * ch * 3);
  const W = width;
  const cx = BALL.cx * W;
  const cy = BALL.cy * height;
  const R = BALL.r * W;
  const lx = BALL.light.x * W;
  const ly = BALL.light.y * height;
  const tight = 2 * (0.03 * W) ** 2;
  const broad = 2 * (0.14 * W) ** 2;
  const phase = (seed % 97) * 0.37; // a different marbling per seed, same lighting
  let o = 0;
  for (let Y = 0; Y < ch; Y++) {
    const y = Y - margin;
    const v = y / height;
    for (let X = 0; X < cw; X++) {
      const x = X - margin;
      const u = x / W;
      const d = Math.sqrt((x - cx) ** 2 + (y - cy) ** 2);
      const inside = Math.min(1, Math.max(0, (R - d) / 1.5)); // 1.5 px anti-aliased limb
      const back = 16 + 12 * v;
      let r = back;
      let g = back;
      let b = back + 2;
      if (inside > 0) {
        const nz = Math.sqrt(Math.max(0, 1 - (d / R) ** 2));
        const diffuse = 0.22 + 0.78 * nz ** 1.3;
        const m = 0.5 + 0.5 * Math.sin(7 * u + 2.6 * Math.sin(4 * v + 3 * u + phase));
        const fine = 0.06 * Math.sin(31 * u + 6 * Math.sin(17 * v + phase));
        const mix = Math.min(1, Math.max(0, m + fine));
        const l2 = (x - lx) ** 2 + (y - ly) ** 2;
        const spec = Math.exp(-l2 / tight);
        const sheen = Math.exp(-l2 / broad);
        const tex = 7 * grain(X, Y, seed);
        const sr = ((205 * (1 - mix) + 150 * mix) * diffuse + 240 * spec + 45 * sheen + tex) * inside;
        const sg = ((88 * (1 - mix) + 38 * mix) * diffuse + 235 * spec + 30 * sheen + tex * 0.6) * inside;
        const sb = ((34 * (1 - mix) + 30 * mix) * diffuse + 225 * spec + 22 * sheen + tex * 0.4) * inside;
        r = sr + back * (1 - inside);
        g = sg + back * (1 - inside);
        b = sb + (back + 2) * (1 - inside);
      }
      px[o++] = clamp255(r);
      px[o++] = clamp255(g);
      px[o++] = clamp255(b);
    }
  }
  return Buffer.concat([header, px]);
}

function pam(w: number, h: number, rgba: Buffer): Buffer {
  return Buffer.concat([Buffer.from(`P7\nWIDTH ${w}\nHEIGHT ${h}\nDEPTH 4\nMAXVAL 255\nTUPLTYPE RGB_ALPHA\nENDHDR\n`, "ascii"), rgba]);
}

export interface Sprite {
  data: Buffer;
  width: number;
  height: number;
  /** Where the sprite's centre sits relative to the drop's centre, px. */
  dx: number;
  dy: number;
}

const even = (v: number) => 2 * Math.ceil(v / 2);

/**
 * The oil itself: a dark, slightly warm lens whose opacity follows a drop's thickness (a flat
 * dome), with a denser meniscus at the rim. As the graph fades it, the thin rim goes first, so
 * the spot seems to shrink as well as pale.
 */
export function dropSprite(rx: number, ry: number): Sprite {
  const w = even(2 * rx + 4);
  const h = even(2 * ry + 4);
  const buf = Buffer.alloc(w * h * 4);
  for (let y = 0; y < h; y++) {
    for (let x = 0; x < w; x++) {
      const ex = (x + 0.5 - w / 2) / rx;
      const ey = (y + 0.5 - h / 2) / ry;
      const rho = Math.sqrt(ex * ex + ey * ey);
      const edge = Math.min(1, Math.max(0, (1 - rho) * Math.min(rx, ry))); // ~1 px soft edge
      const dome = Math.max(0, 1 - rho * rho) ** 0.3;
      const rim = rho > 0.82 && rho < 1 ? 0.12 : 0;
      const a = Math.min(1, 0.8 * dome + rim) * edge;
      const o = (y * w + x) * 4;
      buf[o] = 30;
      buf[o + 1] = 11;
      buf[o + 2] = 6;
      buf[o + 3] = Math.round(255 * a);
    }
  }
  return { data: pam(w, h, buf), width: w, height: h, dx: 0, dy: 0 };
}

/** The wet gloss: a small highlight on the lens, on the side facing the light. It dulls first. */
export function glintSprite(rx: number, ry: number): Sprite {
  const gx = Math.max(1.5, 0.3 * rx);
  const gy = Math.max(1, 0.2 * ry);
  const w = even(2 * gx + 4);
  const h = even(2 * gy + 4);
  const buf = Buffer.alloc(w * h * 4);
  for (let y = 0; y < h; y++) {
    for (let x = 0; x < w; x++) {
      const ex = (x + 0.5 - w / 2) / gx;
      const ey = (y + 0.5 - h / 2) / gy;
      const a = 0.85 * Math.exp(-3 * (ex * ex + ey * ey));
      const o = (y * w + x) * 4;
      buf[o] = 255;
      buf[o + 1] = 246;
      buf[o + 2] = 232;
      buf[o + 3] = Math.round(255 * a);
    }
  }
  return { data: pam(w, h, buf), width: w, height: h, dx: -0.38 * rx, dy: -0.42 * ry };
}
