// Millisecond timestamps whose database defaults match their precision. With TypeORM's own
// default (CURRENT_TIMESTAMP(6) on a datetime(3)) every generated migration re-altered them.
export const createdAtColumn = { type: 'datetime', precision: 3, createDate: true, default: () => 'CURRENT_TIMESTAMP(3)' } as const
export const updatedAtColumn = {
  type: 'datetime',
  precision: 3,
  updateDate: true,
  default: () => 'CURRENT_TIMESTAMP(3)',
  onUpdate: 'CURRENT_TIMESTAMP(3)',
} as const
