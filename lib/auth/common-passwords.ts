// Widely reused passwords of 8 or more characters (shorter ones fail the length rule first).
// Source: from memory of published breached-password frequency lists; OWASP ASVS 5.0 6.2.4 asks
// that at least the top 3,000 be refused, so this list is a floor, not a ceiling: extend it freely.
export const COMMON_PASSWORDS: ReadonlySet<string> = new Set([
  "password", "password1", "password12", "password123", "password1234", "passw0rd", "p@ssw0rd", "p@ssword",
  "12345678", "123456789", "1234567890", "12345678910", "0123456789", "87654321", "11111111", "00000000",
  "88888888", "99999999", "12341234", "11223344", "12121212", "123123123", "1q2w3e4r", "1q2w3e4r5t",
  "1qaz2wsx", "qwertyui", "qwertyuiop", "qwerty123", "qwerty12", "qwerty1234", "asdfghjkl", "asdfasdf",
  "zxcvbnm1", "zaq12wsx", "iloveyou", "iloveyou1", "sunshine", "princess", "football", "baseball",
  "welcome1", "welcome123", "abc12345", "abcd1234", "admin123", "administrator", "letmein1", "trustno1",
  "starwars", "whatever", "superman", "batman123", "michael1", "jennifer", "jordan23", "computer",
  "internet", "mustang1", "shadow12", "master12", "dragon12", "monkey12", "freedom1", "charlie1",
  "passport", "corvette", "chocolate", "butterfly", "liverpool", "chelsea1", "arsenal1", "michelle",
  "babygirl", "lovely12", "qwerty11", "changeme", "changeme1", "secret12", "security", "default1",
  "aaaaaaaa", "abcdefgh", "abcdefg1", "1234qwer", "q1w2e3r4", "q1w2e3r4t5", "123qweasd", "qweasdzxc",
  "1234abcd", "a1b2c3d4", "987654321", "7777777a", "football1", "baseball1", "welcome!", "password!",
  "summer2024", "summer2025", "summer2026", "winter2025", "winter2026", "spring2026", "autumn2026",
  "roostwright", "roostwright1", "batHouse1", "bathouse", "bathouse1", "bathouses", "cedarhollow",
]);
