// wilson-score 1.0.0 ships no types: the Wilson lower bound of up/total at a given z.
declare module "wilson-score" {
  export default function wilsonLower(up: number, total: number, z?: number): number;
}
