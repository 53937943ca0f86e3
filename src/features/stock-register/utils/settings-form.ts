import type { StockSettings } from '#shared/schemas/stock'

/** The form keeps the causes as lines of text; the server takes a list. */
export type SettingsFormValues = Omit<StockSettings, 'mortalityCauses'> & { causes: string }

export const toSettingsForm = (s: StockSettings): SettingsFormValues => {
  const { mortalityCauses, ...rest } = s
  return { ...rest, causes: mortalityCauses.join('\n') }
}

export const toSettingsInput = ({ causes, ...rest }: SettingsFormValues): StockSettings => ({
  ...rest,
  mortalityCauses: [
    ...new Set(
      causes
        .split('\n')
        .map((c) => c.trim())
        .filter(Boolean),
    ),
  ],
})
