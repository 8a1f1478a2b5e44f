/**
 * Forms a browser's URL parser turns into another origin, or that a server would decode into one: control
 * characters are dropped, a backslash is a slash, and an encoded slash may be decoded on the way.
 */
export const BYPASS_FORMS = [
  "//evil.example.com",
  "/\t/evil.example.com",
  "/\n/evil.example.com",
  "/\r/evil.example.com",
  "\t//evil.example.com",
  " //evil.example.com",
  "/\\evil.example.com",
  "\\\\evil.example.com",
  "/\\/evil.example.com",
  "\\/evil.example.com",
  "/%2F/evil.example.com",
  "/%2f%2fevil.example.com",
  "/%5Cevil.example.com",
  "/%09/evil.example.com",
  "https://evil.example.com/overview",
  "http:evil.example.com",
  "javascript:alert(1)",
  "/\u0000/evil.example.com",
  "/\u00a0/evil.example.com",
  "///evil.example.com",
  "/.//evil.example.com",
  "//evil.example.com/%2e%2e",
  "/..//evil.example.com",
];
