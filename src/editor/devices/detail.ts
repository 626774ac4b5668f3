import { createContext } from 'react';
import type { TextDetail } from '../visible.ts';

/** How much text part views draw at the current zoom (provided by the scene layer). */
export const TextDetailContext = createContext<TextDetail>('full');
