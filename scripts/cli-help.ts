/**
 * The command line's help text (`tenderline --help`, `tenderline help`, `tenderline squeeze -h`).
 * Mesh levels and body models are read from fem, so the text follows any rename there.
 */
import { BODY_MODELS, MESH_LEVELS } from '../fem';

const or = (words: readonly string[]) =>
  words.length > 1 ? `${words.slice(0, -1).join(', ')} or ${words[words.length - 1]}` : words[0];

/** The help text, ending in a newline. */
export function helpText(): string {
  return `Usage: tenderline squeeze [options] [--json]
       tenderline --help

Squeezes a fruit between two opposed pads with the finite-element model and prints force,
contact size and pressures against pad travel, the grip and its bruise margin.
Screening estimate from a linear-elastic model; not a substitute for bruise tests.

Fruit (give --diameter-mm, or both --axial-mm and --equatorial-mm):
  --diameter-mm N            diameter of a round fruit, mm
  --axial-mm N               length along the squeeze axis, mm
  --equatorial-mm N          width across the squeeze axis, mm
  --modulus-mpa N            elastic modulus of the flesh, MPa (required)
  --poisson N                Poisson's ratio of the flesh (required)
  --density N                density, kg/m³ (needed with --friction)
  --threshold-kpa N          bruise threshold, kPa (gives the bruise margin)
  --failure-shear-kpa N      failure shear stress, kPa

Pads and motion:
  --travel-mm N              travel of each pad, mm (required)
  --steps N                  load steps up to that travel
  --pad-diameter-mm N        pad diameter, mm
  --edge-radius-mm N         rounding of the pad edge, mm
  --facing-modulus-mpa N     modulus of a compliant pad facing, MPa
  --facing-thickness-mm N    thickness of that facing, mm
  --facing-poisson N         Poisson's ratio of that facing
  --friction N               friction coefficient between pad and fruit
  --safety-factor N          safety factor on the fruit's weight
  --accel-g N                acceleration of the move, in g

Model:
  --mesh LEVEL               ${or(MESH_LEVELS)}
  --model NAME               ${or(BODY_MODELS)}

Output:
  --json                     one JSON object instead of the table
  -h, --help                 this text

Exit status: 0 on success, 2 for a bad option or value (one line on stderr), 1 if the model
does not converge.

Example:
  tenderline squeeze --diameter-mm 80 --modulus-mpa 3 --poisson 0.35 --travel-mm 1 \\
    --pad-diameter-mm 30 --density 840 --friction 0.4 --safety-factor 2 --threshold-kpa 150
`;
}

/** True when the arguments ask for help: `--help` or `-h` anywhere, or `help` as the command. */
export function wantsHelp(argv: string[]): boolean {
  return argv[0] === 'help' || argv.some((a) => a === '--help' || a === '-h');
}
