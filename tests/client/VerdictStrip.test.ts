// @vitest-environment jsdom
import { describe, expect, it } from 'vitest'
import { mount } from '@vue/test-utils'
import { createVuetify } from 'vuetify'
import * as components from 'vuetify/components'
import * as directives from 'vuetify/directives'
import { aliases, mdi } from 'vuetify/iconsets/mdi-svg'
import type { TargetMask } from '@shared/room'
import VerdictStrip from '@/components/VerdictStrip.vue'

globalThis.ResizeObserver ??= class {
  observe(): void {}
  unobserve(): void {}
  disconnect(): void {}
}

// An invented two-band mask.
const MASK: TargetMask = {
  id: 'test',
  name: 'Test mask',
  kind: 'custom',
  citation: null,
  sourceNote: 'invented for the test',
  notes: [],
  bands: [
    { centreHz: 250, minS: 0.2, maxS: 0.3, nominalS: null },
    { centreHz: 1000, minS: 0.2, maxS: 0.3, nominalS: null },
  ],
}

describe('VerdictStrip', () => {
  it('returns a cell per band with the verdict in words and an icon when given measured bands', () => {
    const wrapper = mount(VerdictStrip, {
      props: {
        mask: MASK,
        measured: [
          { centreHz: 250, reverberationTimeS: 0.45, isReliable: true },
          { centreHz: 1000, reverberationTimeS: 0.25, isReliable: true },
        ],
      },
      global: { plugins: [createVuetify({ components, directives, icons: { defaultSet: 'mdi', aliases, sets: { mdi } } })] },
    })
    const cells = wrapper.findAll('[data-testid="verdict-strip"] li')
    expect(cells.map((c) => c.attributes('data-verdict'))).toEqual(['too-live', 'inside'])
    expect(cells[0]?.text()).toContain('250 Hz')
    expect(cells[0]?.text()).toContain('Too live')
    expect(cells[0]?.text()).toContain('0.45 s')
    expect(cells[1]?.text()).toContain('Inside target')
    expect(cells[0]?.find('svg').exists()).toBe(true)
    expect(cells[0]?.find('[aria-label]').attributes('aria-label')).toBe('250 Hz: measured 0.45 s, target 0.20–0.30 s — too live.')
  })
})
