// jstat ships no types; tests use only these functions as a reference library.
declare module 'jstat' {
  const jStat: {
    studentt: {cdf(t: number, df: number): number; inv(p: number, df: number): number};
    normal: {cdf(x: number, mean: number, sd: number): number};
  };
  export default jStat;
}
