import type { ThermalResult } from '@shared/calc/thermal/schema';
import { ShowTheWork as TraceSteps } from '../../../components/ui/ShowTheWork';

/** Every step of the thermal calculation (the list itself is the shared primitive in components/ui). */
export function ShowTheWork({ result }: { result: ThermalResult }) {
  return <TraceSteps steps={result.trace} />;
}
