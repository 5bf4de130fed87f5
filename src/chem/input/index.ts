/** Every entrance's checks on what a user hands in: the one strict JSON reader and the one structure check. */
export * from './strict-json-error';
export * from './utf8';
export * from './strict-json';
export * from './structure-check';
