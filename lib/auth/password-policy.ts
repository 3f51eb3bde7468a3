/**
 * Password rules shared by the browser forms and the server (no hashing library here, so it can
 * ship to the client). bcrypt only reads the first 72 bytes, so longer passwords are refused
 * rather than silently truncated.
 */
export const PASSWORD_MIN_LENGTH = 10;
export const PASSWORD_MAX_BYTES = 72;

// A short list of passwords that appear at the top of every published leak list (common practice:
// refuse the most-guessed ones outright). Compared case-insensitively.
const COMMON_PASSWORDS = new Set([
  "password", "password1", "password12", "password123", "password1234", "passw0rd", "p@ssw0rd",
  "123456789", "1234567890", "12345678910", "0123456789", "9876543210", "1111111111", "0000000000",
  "qwertyuiop", "qwerty1234", "qwerty12345", "1q2w3e4r5t", "1qaz2wsx3edc", "asdfghjkl", "asdfghjkl1",
  "iloveyou12", "letmein123", "welcome123", "changeme123", "administrator", "trustno1234",
  "concrete123", "caryatid123", "football123", "baseball123", "superman123", "zaq12wsxcde",
]);

/** Why a password is too weak, or null when it is acceptable. `context` holds the e-mail and name. */
export function describePasswordWeakness(password: string, context: { email?: string; name?: string } = {}): string | null {
  if (password.length < PASSWORD_MIN_LENGTH) return `use at least ${PASSWORD_MIN_LENGTH} characters`;
  if (new TextEncoder().encode(password).length > PASSWORD_MAX_BYTES) return `use at most ${PASSWORD_MAX_BYTES} bytes (about ${PASSWORD_MAX_BYTES} plain characters)`;
  const lower = password.toLowerCase();
  if (COMMON_PASSWORDS.has(lower)) return "this password is one of the most commonly guessed; choose another";
  if (new Set(lower).size <= 2) return "use more than two different characters";
  if (isRun(lower)) return "a run of consecutive keys or digits is easy to guess; choose another";
  if (builtFrom(lower, context.email?.split("@")[0])) return "do not build the password from your e-mail address";
  if (builtFrom(lower, context.name)) return "do not build the password from your name";
  return null;
}

function isRun(s: string): boolean {
  let up = true;
  let down = true;
  for (let i = 1; i < s.length; i++) {
    const d = s.charCodeAt(i) - s.charCodeAt(i - 1);
    if (d !== 1) up = false;
    if (d !== -1) down = false;
  }
  return up || down;
}

/**
 * True when the password is mostly made of the words of `source` (an address's local part or a
 * name): with those words (4+ letters) taken out, fewer than 6 letters or digits are left.
 */
function builtFrom(password: string, source: string | undefined): boolean {
  const words = (source ?? "").toLowerCase().split(/[^\p{L}\p{N}]+/u).filter((w) => w.length >= 4);
  if (words.length === 0) return false;
  let rest = password;
  let used = false;
  for (const word of words) {
    if (rest.includes(word)) {
      rest = rest.split(word).join("");
      used = true;
    }
  }
  return used && rest.replace(/[^\p{L}\p{N}]/gu, "").length < 6;
}
