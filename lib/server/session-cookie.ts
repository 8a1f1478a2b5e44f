/**
 * The session cookie's name and attributes. In production the name carries the `__Host-` prefix: the
 * browser then keeps it only if it is Secure, has path / and no Domain, so no other host under the same
 * domain and no plain-HTTP page can plant or overwrite it. (Chromium treats http://localhost as secure, so
 * the production build still signs in there.)
 */
export function sessionCookieSettings(production: boolean) {
  return {
    name: production ? "__Host-towmargin_session" : "towmargin_session",
    attributes: { secure: production, sameSite: "lax" as const, path: "/" },
  };
}
