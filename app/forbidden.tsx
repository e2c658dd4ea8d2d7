import { NotAllowed } from "@/components/auth/not-allowed";

// Answered with status 403 when a page calls forbidden(): today, an admin page opened by an account without the
// admin role.
export default function Forbidden() {
  return <NotAllowed what="The admin area" />;
}
