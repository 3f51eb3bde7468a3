/** The signed-in person as route handlers see it (from the JWT session). */
export interface SessionUser {
  id: string;
  email: string;
  name: string;
}
