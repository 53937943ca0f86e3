import type request from 'supertest'

/** A supertest request whose method comes from a route table ('POST', 'get', ...). */
export function requestByMethod(agent: request.Agent | ReturnType<typeof request>, method: string, path: string): request.Test {
  const byMethod = agent as unknown as Record<string, (p: string) => request.Test>
  return byMethod[method.toLowerCase()](path)
}
