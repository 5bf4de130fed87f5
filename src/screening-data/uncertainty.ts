/** The 1σ of a row's salt-limited solubility and pH_max: one implementation, in the core. */
export { uncertaintiesOf } from '@/chem';
