// The proxy only redirects the signed-out to the sign-in page. Every page,
// route handler and action still checks role and organization on the server.
import { withAuth } from "next-auth/middleware";

export default withAuth({ pages: { signIn: "/login" } });

export const config = {
  matcher: ["/((?!api|login|forgot|reset|invite|_next|favicon.ico|icon.svg|forbidden).*)"],
};
