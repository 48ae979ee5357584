import { execFile } from 'node:child_process';
import { copyFile, stat, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { promisify } from 'node:util';

const run = promisify(execFile);

/** The shipped font the demo frames are drawn in (ffmpeg's drawtext reads woff2 through FreeType). */
export const DEMO_FONT = fileURLToPath(
  new URL('../../../../fonts/atkinson-hyperlegible/atkinson-hyperlegible-latin-700-normal.woff2', import.meta.url),
);

export interface DemoCaptionTrack {
  language: string;
  label: string;
  isDefault: boolean;
  cues: { start: number; end: number; text: string }[];
}

/** One invented demonstration: what it looks like, how long it is, and what its captions say. */
export interface DemoRecording {
  fileName: string;
  /** Drawn at the top of every frame. */
  heading: string;
  width: number;
  height: number;
  seconds: number;
  toneHz: number;
  background: string;
  /** Still shapes: ffmpeg filters drawn on the background. */
  shapes: string;
  /** The moving part (a magnet, a wire, a bob): its size and ffmpeg overlay position, `t` in seconds. */
  mover: { size: string; x: string; y: string };
  captions: DemoCaptionTrack[];
}

const copper = 'drawbox=x=560:y=120:w=160:h=560:color=0xb87333@1:t=fill';
const balanceRig = 'drawbox=x=140:y=250:w=180:h=260:color=0x6c757d@1:t=fill,drawbox=x=960:y=250:w=180:h=260:color=0x6c757d@1:t=fill';

/** Made-up demonstrations with plain classroom physics; nothing here is taken from anywhere. */
export const DEMO_RECORDINGS: DemoRecording[] = [
  {
    fileName: 'Demo: magnet through a copper tube.mp4',
    heading: 'Demo: magnet through a copper tube',
    width: 1280,
    height: 720,
    seconds: 10,
    toneHz: 440,
    background: '0x14213d',
    shapes: copper,
    // The magnet drops at a steady speed: eddy currents hold it near terminal velocity.
    mover: { size: '60x60', x: '610', y: '130+48*t' },
    captions: [
      {
        language: 'en',
        label: 'English',
        isDefault: true,
        cues: [
          { start: 0, end: 3, text: 'A strong magnet is let go at the top of a copper tube.' },
          { start: 3, end: 6.5, text: 'It falls slowly: its moving field drives eddy currents in the copper.' },
          { start: 6.5, end: 10, text: 'Those currents oppose the motion, so the magnet settles at a steady speed.' },
        ],
      },
      {
        language: 'fr',
        label: 'Français',
        isDefault: false,
        cues: [
          { start: 0, end: 3, text: 'Un aimant puissant est lâché en haut d’un tube de cuivre.' },
          { start: 3, end: 6.5, text: 'Il tombe lentement : son champ en mouvement crée des courants de Foucault.' },
          { start: 6.5, end: 10, text: 'Ces courants s’opposent au mouvement ; l’aimant garde une vitesse constante.' },
        ],
      },
    ],
  },
  {
    fileName: 'Demo: current balance.mp4',
    heading: 'Demo: current balance',
    width: 1280,
    height: 720,
    seconds: 8,
    toneHz: 330,
    background: '0x1b2a1f',
    shapes: balanceRig,
    // The wire between the magnets dips once the current is switched on at 3 s.
    mover: { size: '640x16', x: '320', y: '372+if(gt(t,3),min((t-3)*30,60),0)' },
    captions: [
      {
        language: 'en',
        label: 'English',
        isDefault: true,
        cues: [
          { start: 0, end: 3, text: 'A straight wire sits in the field between two magnets.' },
          { start: 3, end: 5.5, text: 'With the current on, the force on the wire tips the balance.' },
          { start: 5.5, end: 8, text: 'Doubling the current doubles the force: F = BIL.' },
        ],
      },
    ],
  },
  {
    fileName: 'Demo: pendulum timing (phone, portrait).mp4',
    heading: 'Demo: pendulum timing',
    width: 720,
    height: 1280,
    seconds: 12,
    toneHz: 523,
    background: '0x2b193d',
    shapes: 'drawbox=x=355:y=200:w=10:h=10:color=white@1:t=fill',
    // A 1 m pendulum: period about 2 s, so the bob crosses the middle once a second, lowest there.
    mover: { size: '60x60', x: '330+220*sin(PI*t)', y: '760-40*pow(sin(PI*t),2)' },
    captions: [
      {
        language: 'en',
        label: 'English',
        isDefault: true,
        cues: [
          { start: 0, end: 4, text: 'Time ten full swings rather than one: the reaction-time error shrinks tenfold.' },
          { start: 4, end: 8, text: 'A pendulum about 1 m long swings with a period close to 2 s.' },
          { start: 8, end: 12, text: 'Divide the total time by ten to get one period.' },
        ],
      },
    ],
  },
];

function timestamp(seconds: number): string {
  const ms = Math.round(seconds * 1000);
  const h = String(Math.floor(ms / 3_600_000)).padStart(2, '0');
  const m = String(Math.floor((ms % 3_600_000) / 60_000)).padStart(2, '0');
  const s = String(Math.floor((ms % 60_000) / 1000)).padStart(2, '0');
  return `${h}:${m}:${s}.${String(ms % 1000).padStart(3, '0')}`;
}

/** A WebVTT file of a caption track. */
export function toWebVtt(track: DemoCaptionTrack): string {
  const cues = track.cues.map((cue, index) => `${index + 1}\n${timestamp(cue.start)} --> ${timestamp(cue.end)}\n${cue.text}\n`);
  return `WEBVTT\n\n${cues.join('\n')}`;
}

/**
 * Draws a demonstration with ffmpeg: background, scene, its title and a running clock in the
 * shipped font, and a quiet tone. The font and title go through files in `workDir`, so neither a
 * path nor a title needs escaping for ffmpeg's filter syntax.
 */
export async function generateDemoVideo(demo: DemoRecording, workDir: string, index: number): Promise<string> {
  // drawtext with a missing font exits 0 and draws nothing: check first.
  const fontInfo = await stat(DEMO_FONT).catch(() => null);
  if (!fontInfo?.isFile()) throw new Error(`The demo font is missing: ${DEMO_FONT} (it ships in fonts/).`);
  const font = path.join(workDir, `font-${index}.woff2`);
  const title = path.join(workDir, `title-${index}.txt`);
  await copyFile(DEMO_FONT, font);
  await writeFile(title, demo.heading);
  const output = path.join(workDir, `demo-${index}.mp4`);
  const fontSize = Math.round(Math.max(demo.width, demo.height) / 29);
  const text = `drawtext=fontfile=${font}:textfile=${title}:fontcolor=white:fontsize=${fontSize}:x=40:y=40`;
  const clock = `drawtext=fontfile=${font}:text='%{pts\\:hms}':fontcolor=white:fontsize=${Math.round(fontSize * 0.75)}:x=40:y=h-80`;
  const { mover } = demo;
  const graph = [
    `[0:v]${demo.shapes}[bg]`,
    `[bg][1:v]overlay=x='${mover.x}':y='${mover.y}':shortest=1[scene]`,
    `[scene]${text},${clock}[v]`,
    '[2:a]volume=0.2[a]',
  ].join(';');
  await run('ffmpeg', [
    ...['-hide_banner', '-loglevel', 'error', '-y'],
    ...['-f', 'lavfi', '-i', `color=c=${demo.background}:size=${demo.width}x${demo.height}:rate=24:duration=${demo.seconds}`],
    ...['-f', 'lavfi', '-i', `color=c=0xe63946:size=${mover.size}:rate=24:duration=${demo.seconds}`],
    ...['-f', 'lavfi', '-i', `sine=frequency=${demo.toneHz}:sample_rate=48000:duration=${demo.seconds}`],
    ...['-filter_complex', graph, '-map', '[v]', '-map', '[a]'],
    ...['-c:v', 'libx264', '-preset', 'ultrafast', '-pix_fmt', 'yuv420p', '-g', '48'],
    ...['-c:a', 'aac', '-b:a', '96k', '-movflags', '+faststart', '-shortest', output],
  ]);
  return output;
}
