export {
  headDepth,
  validateShape,
  tankHeight,
  totalVolume,
  volumeAtLevel,
  fractionAtLevel,
  levelAtFraction,
} from './geometry.js';
