import { createRouter, createWebHistory, type RouteLocationNormalized } from 'vue-router'
import type { Role } from '@shared/api'
import { authGuard } from './authGuard'

declare module 'vue-router' {
  interface RouteMeta {
    /** guest: only signed-out visitors; member (default): only signed-in users; any: everyone. */
    access?: 'guest' | 'member' | 'any'
    /** Roles in the current workspace that may open the page. */
    roles?: readonly Role[]
    title?: string
  }
}

const ROOM_MANAGERS: readonly Role[] = ['owner', 'engineer']
const roomIdProp = (route: RouteLocationNormalized) => ({ roomId: Number(route.params.roomId) })
const surveyProps = (route: RouteLocationNormalized) => ({ roomId: Number(route.params.roomId), surveyId: Number(route.params.surveyId) })
const captureIdProp = (route: RouteLocationNormalized) => ({ captureId: Number(route.params.captureId) })
const tokenProp = (route: RouteLocationNormalized) => ({ token: String(route.params.token) })

export const router = createRouter({
  history: createWebHistory(import.meta.env.BASE_URL),
  routes: [
    { path: '/', redirect: '/rooms' },
    { path: '/sign-in', name: 'sign-in', component: () => import('@/views/SignInView.vue'), meta: { access: 'guest', title: 'Sign in' } },
    { path: '/register', name: 'register', component: () => import('@/views/RegisterView.vue'), meta: { access: 'guest', title: 'Create an account' } },
    { path: '/rooms', name: 'rooms', component: () => import('@/views/RoomsView.vue'), meta: { title: 'Rooms' } },
    { path: '/rooms/new', name: 'room-new', component: () => import('@/views/RoomFormView.vue'), meta: { roles: ROOM_MANAGERS, title: 'New room' } },
    { path: '/rooms/:roomId(\\d+)', name: 'room', component: () => import('@/views/RoomView.vue'), props: roomIdProp, meta: { title: 'Room' } },
    { path: '/rooms/:roomId(\\d+)/edit', name: 'room-edit', component: () => import('@/views/RoomFormView.vue'), props: roomIdProp, meta: { title: 'Edit room' } },
    { path: '/rooms/:roomId(\\d+)/surveys/:surveyId(\\d+)', name: 'survey', component: () => import('@/views/SurveyView.vue'), props: surveyProps, meta: { title: 'Survey' } },
    { path: '/rooms/:roomId(\\d+)/model', name: 'room-model', component: () => import('@/views/RoomModelView.vue'), props: roomIdProp, meta: { title: 'Room model' } },
    { path: '/rooms/:roomId(\\d+)/compare', name: 'compare', component: () => import('@/views/CompareView.vue'), props: roomIdProp, meta: { title: 'Compare surveys' } },
    { path: '/captures/:captureId(\\d+)', name: 'capture', component: () => import('@/views/CaptureView.vue'), props: captureIdProp, meta: { title: 'Capture' } },
    { path: '/test-signal', name: 'test-signal', component: () => import('@/views/TestSignalView.vue'), meta: { title: 'Test signal' } },
    { path: '/learn', name: 'learn', component: () => import('@/views/LearnView.vue'), meta: { access: 'any', title: 'Learn: how sound decays' } },
    { path: '/invitations/:token', name: 'invitation', component: () => import('@/views/InvitationView.vue'), props: tokenProp, meta: { access: 'any', title: 'Invitation' } },
    { path: '/forgot-password', name: 'forgot-password', component: () => import('@/views/ForgotPasswordView.vue'), meta: { access: 'guest', title: 'Forgot password' } },
    { path: '/reset-password/:token', name: 'reset-password', component: () => import('@/views/ResetPasswordView.vue'), props: tokenProp, meta: { access: 'guest', title: 'Choose a new password' } },
    { path: '/shared/:token', name: 'shared', component: () => import('@/views/SharedComparisonView.vue'), props: tokenProp, meta: { access: 'any', title: 'Shared report' } },
    { path: '/dev/mailbox', name: 'dev-mailbox', component: () => import('@/views/DevMailboxView.vue'), meta: { access: 'any', title: 'Mailbox (this machine)' } },
    { path: '/workspace/profile', name: 'workspace-profile', component: () => import('@/views/WorkspaceProfileView.vue'), meta: { roles: ROOM_MANAGERS, title: 'Report profile' } },
    { path: '/settings', name: 'settings', component: () => import('@/views/SettingsView.vue'), meta: { title: 'Settings' } },
    { path: '/api-reference', name: 'api-reference', component: () => import('@/views/ApiReferenceView.vue'), meta: { access: 'any', title: 'API reference' } },
    { path: '/workspace/members', name: 'members', component: () => import('@/views/MembersView.vue'), meta: { roles: ROOM_MANAGERS, title: 'Members' } },
    { path: '/:pathMatch(.*)*', name: 'not-found', component: () => import('@/views/NotFoundView.vue'), meta: { access: 'any', title: 'Page not found' } },
  ],
  scrollBehavior: (_to, _from, saved) => saved ?? { top: 0 },
})

router.beforeEach(authGuard)
router.afterEach((to) => {
  document.title = to.meta.title ? `${to.meta.title} · Ringdown` : 'Ringdown'
})
