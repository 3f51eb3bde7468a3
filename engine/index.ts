/**
 * Public surface of the engine: pure TypeScript, US customary units inside
 * (kip, in, ksi, kip-in, kip-in²); SI conversion at the edges (units.ts).
 */
export * from "./types";
export * from "./materials";
export * from "./rebar";
export * from "./section";
export * from "./interaction";
export * from "./slenderness";
export * from "./effective-length";
export * from "./detailing";
export * from "./quantities";
export * from "./member";
export * from "./units";
export { checkMember } from "./check-member";
