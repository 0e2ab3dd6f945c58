// jStat ships no type declarations; the reference tests use this small typed surface.
declare module 'jstat' {
  const jStat: unknown;
  export default jStat;
}
