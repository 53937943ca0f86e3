import { createPerson } from '#server/modules/people/people.service'
import { buildPersonInput } from './factories'
import { DEMO_PEOPLE } from './demo-people'

/** Loads the invented demo facility into an empty, migrated database. */
export async function seedDemo(demoPassword: string, log: (line: string) => void = console.log) {
  for (const person of DEMO_PEOPLE) {
    await createPerson(buildPersonInput({ ...person, password: demoPassword }))
  }
  log(`Seeded ${DEMO_PEOPLE.length} people.`)
}
