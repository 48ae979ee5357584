import { createContext, useContext, type ReactNode } from 'react';
import type { MeDto } from '@core/contracts';

const MeContext = createContext<MeDto | null>(null);

/** The signed-in shell puts the person here once it knows them; pages inside it read it without re-checking. */
export function MeProvider({ me, children }: { me: MeDto; children: ReactNode }) {
  return <MeContext.Provider value={me}>{children}</MeContext.Provider>;
}

export function useSignedInMe(): MeDto {
  const me = useContext(MeContext);
  if (!me) throw new Error('useSignedInMe() is only available inside the signed-in shell.');
  return me;
}
