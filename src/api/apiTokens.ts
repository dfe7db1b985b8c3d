import type { ApiTokenActivityDto, ApiTokenDto, CreateApiTokenBody, CreatedApiTokenDto } from '@shared/api'
import { request } from './http'

export function listApiTokens(): Promise<ApiTokenDto[]> {
  return request<ApiTokenDto[]>('GET', '/tokens')
}

export function createApiToken(body: CreateApiTokenBody): Promise<CreatedApiTokenDto> {
  return request<CreatedApiTokenDto>('POST', '/tokens', body)
}

export function revokeApiToken(tokenId: number): Promise<ApiTokenDto> {
  return request<ApiTokenDto>('DELETE', `/tokens/${tokenId}`)
}

export function listApiTokenActivity(tokenId: number): Promise<ApiTokenActivityDto[]> {
  return request<ApiTokenActivityDto[]>('GET', `/tokens/${tokenId}/activity`)
}
