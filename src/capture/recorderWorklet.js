// Runs on the audio rendering thread: copies the first input channel in blocks of about 4096
// samples and posts them to the page while recording. Plain JS because worklet modules are
// loaded by URL, outside the bundle.
class RingdownRecorderProcessor extends AudioWorkletProcessor {
  constructor() {
    super()
    this.isRecording = false
    this.block = new Float32Array(4096)
    this.filled = 0
    this.port.onmessage = (event) => {
      if (event.data === 'start') this.isRecording = true
      if (event.data === 'stop') {
        this.flush()
        this.isRecording = false
      }
    }
  }

  flush() {
    if (this.filled === 0) return
    const copy = this.block.slice(0, this.filled)
    this.port.postMessage(copy, [copy.buffer])
    this.filled = 0
  }

  process(inputs) {
    const channel = inputs[0] && inputs[0][0]
    if (this.isRecording && channel) {
      let offset = 0
      while (offset < channel.length) {
        const take = Math.min(channel.length - offset, this.block.length - this.filled)
        this.block.set(channel.subarray(offset, offset + take), this.filled)
        this.filled += take
        offset += take
        if (this.filled === this.block.length) this.flush()
      }
    }
    return true
  }
}

registerProcessor('ringdown-recorder', RingdownRecorderProcessor)
