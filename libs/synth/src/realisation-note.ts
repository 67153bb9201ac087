/** A note on what the synthesiser had to change to fit the request onto whole unit lengths. */
export type RealisationNote = {
  /** What was adjusted, e.g. "ring FSR", "delay", "lattice FSR". */
  quantity: string;
  requested: number | null;
  achieved: number;
  unit: string;
  note: string;
};
