/**
 * The exchanger-arrangement stage as the rating and the search call it: ε, NTU and F for N
 * identical shells in series (each counterflow for one tube pass, 1-2 for an even number), from
 * ./effectiveness.ts (Kays & London 1984; Bowman, Mueller & Nagle 1940).
 */
export {
  effectivenessShellsInSeries as effectivenessShells,
  lmtdCorrectionFactorShells as lmtdCorrectionShells,
  ntuShellsInSeries as ntuShells,
} from './effectiveness';
