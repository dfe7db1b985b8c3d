import * as echarts from 'echarts'

/** Renders an ECharts option to an SVG string on the server (ECharts SSR, no DOM). */
export function renderChartSvg(option: echarts.EChartsCoreOption, widthPx: number, heightPx: number): string {
  const chart = echarts.init(null, null, { renderer: 'svg', ssr: true, width: widthPx, height: heightPx })
  try {
    chart.setOption({ animation: false, textStyle: { fontFamily: 'Noto Sans' }, ...option })
    return chart.renderToSVGString()
  } finally {
    chart.dispose()
  }
}
