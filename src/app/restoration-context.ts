import { useOutletContext } from 'react-router';
import type { Restoration } from '../../shared/schemas/restorations';

/** The restoration the notebook's layout loaded, for its tabs. */
export const useRestorationContext = () => useOutletContext<Restoration>();
