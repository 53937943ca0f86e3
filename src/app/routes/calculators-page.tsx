import { useSearchParams } from 'react-router-dom'
import { PageHeader } from '../../components/ui/page-state'
import { BathDoseCalculator } from '../../features/calculators/components/bath-dose-calculator'
import { CALCULATORS, CalculatorTabs } from '../../features/calculators/components/calculator-tabs'
import { CylinderCalculator } from '../../features/calculators/components/cylinder-calculator'
import { RationCalculator } from '../../features/calculators/components/ration-calculator'

export function Component() {
  const [params] = useSearchParams()
  const tool = CALCULATORS.find((c) => c === params.get('tool')) ?? 'bath'
  return (
    <section className="mx-auto flex w-full max-w-6xl flex-col gap-4">
      <PageHeader title="Calculators" />
      <CalculatorTabs current={tool} />
      {tool === 'bath' && <BathDoseCalculator />}
      {tool === 'cylinder' && <CylinderCalculator />}
      {tool === 'ration' && <RationCalculator />}
    </section>
  )
}
