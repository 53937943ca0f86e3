import { PersonEntity } from '../modules/people/person.entity'

/** Every table the app maps; migrations must match these (checked by `npm run db:check`). */
export const entities = [PersonEntity]
