/** One box of a packed order as the shipping desk's forms see it. */
export type NextStepBox = { id: string; description: string; tracked: boolean };
