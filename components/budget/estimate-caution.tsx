import { Banner } from '@/components/ui/banner';

export function EstimateCaution() {
  return (
    <Banner
      testID="caution-estimate"
      tone="info"
      message="A plan is an estimate: weather, smoke, canopy and appliance behaviour vary. Keep a reserve and a way to leave early — fires and road closures happen."
    />
  );
}
