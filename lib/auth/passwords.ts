import bcrypt from "bcryptjs";

// bcrypt with cost 11: about 0.1–0.2 s per hash on this class of machine (common practice, no source).
const COST = 11;
// Compared against when the account does not exist, so both paths take the same time.
const DUMMY_HASH = "$2b$11$g87sB053XmT1kCVTT.plzuEgcrcGpco0bFEdlCbP.7C2gJXHfCyNm";

export function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, COST);
}

export async function verifyPassword(password: string, hash: string | null): Promise<boolean> {
  const ok = await bcrypt.compare(password, hash ?? DUMMY_HASH);
  return hash !== null && ok;
}
