/** The acknowledge and task links an escalation mail carries in its text part. */
export function messageLinks(text: string) {
  const ack = /https?:\/\/\S+\/ack\/[\w.-]+/.exec(text)?.[0] ?? null
  const taskUrl = /https?:\/\/\S+\/tasks\/(\d+)/.exec(text)
  return { ack, taskPath: taskUrl ? `/tasks/${taskUrl[1]}` : null }
}
