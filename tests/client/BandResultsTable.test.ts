// @vitest-environment jsdom
import { describe, expect, it } from 'vitest'
import { mount } from '@vue/test-utils'
import { createVuetify } from 'vuetify'
import * as components from 'vuetify/components'
import * as directives from 'vuetify/directives'
import BandResultsTable from '@/components/BandResultsTable.vue'
import { bandResultFixture } from './bandResultFixture'

// Vuetify measures layout with ResizeObserver, which jsdom lacks.
globalThis.ResizeObserver ??= class {
  observe(): void {}
  unobserve(): void {}
  disconnect(): void {}
}

function mountTable(bands: Parameters<typeof bandResultFixture>[0][]) {
  return mount(BandResultsTable, {
    props: { bands: bands.map((band) => bandResultFixture(band)) },
    global: { plugins: [createVuetify({ components, directives })] },
  })
}

describe('BandResultsTable', () => {
  it('returns a row per band with values in display units when given band results', () => {
    const wrapper = mountTable([{ centreHz: 125 }, { centreHz: 1000 }])
    const rows = wrapper.findAll('[data-testid="band-table"] tbody tr')
    expect(rows).toHaveLength(2)
    const cells = rows[1]?.findAll('td').map((td) => td.text())
    // Band, T20, T30, EDT, C50, C80, D50 %, Ts ms, decay range, σ(T20), σ(T30), flags.
    expect(cells).toEqual(['1k', '0.47', '0.50', '0.51', '5.4', '−1.0', '78', '32', '56.7', '0.02', '0.02', 'None'])
    expect(rows[0]?.find('td').text()).toBe('125')
  })

  it('returns a dash labelled "not computable" when a value is null', () => {
    const wrapper = mountTable([{ T30: null }])
    const missing = wrapper.findAll('.band-results-table__missing')
    expect(missing).toHaveLength(1)
    expect(missing[0]?.text()).toBe('—')
    expect(missing[0]?.attributes('aria-label')).toBe('not computable')
  })

  it('returns a chip per warning and marks the values it qualifies when a band is flagged', () => {
    const wrapper = mountTable([{ warnings: [{ code: 'decay-range-t30', parameters: ['T30'], message: 'Only 38 dB of decay.' }] }])
    const chip = wrapper.find('[data-code="decay-range-t30"]')
    expect(chip.text()).toBe('T30 range')
    const flagged = wrapper.findAll('.band-results-table__flagged')
    expect(flagged).toHaveLength(1)
    expect(flagged[0]?.text()).toContain('0.50')
  })

  it('returns header titles with units', () => {
    const headers = mountTable([{}]).findAll('thead th').map((th) => th.text())
    expect(headers).toEqual(['Octave (Hz)', 'T20 (s)', 'T30 (s)', 'EDT (s)', 'C50 (dB)', 'C80 (dB)', 'D50 (%)', 'Ts (ms)', 'Decay range (dB)', 'σ(T20) (s)', 'σ(T30) (s)', 'Flags'])
  })
})
