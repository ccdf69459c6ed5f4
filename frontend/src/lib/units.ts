// The display units live with the contract, so the screens, the exports and the calc package
// convert and label numbers the same way.
export {
  formatNumber,
  fromDisplay,
  massHeader,
  toDisplay,
  unitLabel,
  type Quantity,
  type UnitSystem,
} from '@tiermode/shared-types';
