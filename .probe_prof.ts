import { synthesizeRoomImpulse } from './shared/acoustics/synthetic/synthesizeRoomImpulse'
const bands = [63, 125, 250, 500, 1000, 2000, 4000, 8000].map((c) => ({ centreHz: c, T60S: 0.4 }))
for (let r = 0; r < 3; r++) synthesizeRoomImpulse({ sampleRateHz: 48000, durationS: 10, seed: r, noiseFloorDb: -90, bandDecays: bands })
