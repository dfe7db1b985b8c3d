import * as wavefileModule from 'wavefile'

type WaveFileConstructor = typeof wavefileModule.WaveFile

/**
 * The wavefile package's WaveFile class under both module systems: Node loads its CommonJS build
 * (named exports only through `default`), bundlers load its ES module (named export only).
 */
export const WaveFile: WaveFileConstructor =
  (wavefileModule as { WaveFile?: WaveFileConstructor }).WaveFile ??
  (wavefileModule as unknown as { default: { WaveFile: WaveFileConstructor } }).default.WaveFile
