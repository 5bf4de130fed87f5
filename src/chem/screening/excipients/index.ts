/** Excipients' microenvironment: the bundled slurry-pH table and the salt × excipient conversion risk. */
export * from './excipients.data';
export * from './excipient-risk';
