import { EntitySchema } from 'typeorm'
import { SHIFT_KINDS } from '#shared/schemas/roster'
import { createdAtColumn } from '../../db/timestamps'
import { references } from '../../db/foreign-keys'

export interface ShiftRow {
  id: number
  personId: number
  date: string
  start: string
  end: string
  kind: (typeof SHIFT_KINDS)[number]
}

export const ShiftEntity = new EntitySchema<ShiftRow>({
  name: 'Shift',
  tableName: 'shifts',
  columns: {
    id: { type: 'int', primary: true, generated: 'increment' },
    personId: { type: 'int', foreignKey: references('Person') },
    date: { type: 'varchar', length: 10 },
    start: { type: 'varchar', length: 5 },
    end: { type: 'varchar', length: 5 },
    kind: { type: 'enum', enum: [...SHIFT_KINDS] },
  },
  indices: [{ columns: ['date'] }, { columns: ['personId', 'date'] }],
})

export interface OnCallRow {
  id: number
  personId: number
  fromDate: string
  toDate: string
  startsAt: Date
  endsAt: Date
}

export const OnCallEntity = new EntitySchema<OnCallRow>({
  name: 'OnCall',
  tableName: 'on_call_duties',
  columns: {
    id: { type: 'int', primary: true, generated: 'increment' },
    personId: { type: 'int', foreignKey: references('Person') },
    fromDate: { type: 'varchar', length: 10 },
    toDate: { type: 'varchar', length: 10 },
    startsAt: { type: 'datetime', precision: 3 },
    endsAt: { type: 'datetime', precision: 3 },
  },
  indices: [{ columns: ['startsAt', 'endsAt'] }],
})

export interface HandoverNoteRow {
  id: number
  personId: number
  text: string
  createdAt: Date
}

export const HandoverNoteEntity = new EntitySchema<HandoverNoteRow>({
  name: 'HandoverNote',
  tableName: 'handover_notes',
  columns: {
    id: { type: 'int', primary: true, generated: 'increment' },
    personId: { type: 'int', foreignKey: references('Person') },
    text: { type: 'text' },
    createdAt: createdAtColumn,
  },
})
