import { createContext, useContext } from 'react';

/** The school's locale inside the player (from the student view): answers are read with its decimal sign. */
export const PlayerLocaleContext = createContext<string | undefined>(undefined);

export const usePlayerLocale = () => useContext(PlayerLocaleContext);
