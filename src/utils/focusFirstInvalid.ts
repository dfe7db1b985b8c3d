import { nextTick } from 'vue'

/** After a failed submit, moves keyboard focus to the first input that shows a message. */
export async function focusFirstInvalid(root: ParentNode = document): Promise<void> {
  await nextTick()
  root.querySelector<HTMLElement>('.v-input--error input, .v-input--error textarea')?.focus()
}
