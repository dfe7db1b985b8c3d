import { describe, expect, it } from 'vitest'
import type { SurveyDto } from '@shared/api'
import { invitableRoles } from '@/forms/invitableRoles'
import { defaultReportSurveyIds } from '@/forms/reportChoice'

const survey = (id: number) => ({ id }) as SurveyDto

describe('defaultReportSurveyIds', () => {
  it('returns the first and the last survey when there are two or more', () => {
    expect(defaultReportSurveyIds([survey(4), survey(7), survey(9)])).toEqual([4, 9])
  })

  it('returns nothing when there are fewer than two surveys', () => {
    expect(defaultReportSurveyIds([survey(4)])).toEqual([])
    expect(defaultReportSurveyIds([])).toEqual([])
  })
})

describe('invitableRoles', () => {
  it('returns every role for an owner and only client and viewer for an engineer (the server’s rule)', () => {
    expect(invitableRoles('owner')).toEqual(['owner', 'engineer', 'client', 'viewer'])
    expect(invitableRoles('engineer')).toEqual(['client', 'viewer'])
  })

  it('returns no role for clients, viewers and the signed-out', () => {
    expect(invitableRoles('client')).toEqual([])
    expect(invitableRoles('viewer')).toEqual([])
    expect(invitableRoles(null)).toEqual([])
  })
})
