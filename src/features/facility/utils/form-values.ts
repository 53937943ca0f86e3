// react-hook-form also runs setValueAs on the untouched default (null), so both '' and null mean "none".
export const toOptionalNumber = (v: unknown) => (v === '' || v == null ? null : Number(v))

export const toRequiredNumber = (v: unknown) => (v === '' || v == null ? Number.NaN : Number(v))
