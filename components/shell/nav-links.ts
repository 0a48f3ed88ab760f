// Role-aware navigation: one list, used by the header menu (client) and the area layouts (server).
export type NavRole = "apprentice" | "instructor" | "school_manager" | "admin";
export type NavLink = { href: string; label: string };

export const ROLE_HOME: Record<NavRole, string> = { apprentice: "/learn", instructor: "/teach", school_manager: "/school", admin: "/admin" };

export const ROLE_LABEL: Record<NavRole, string> = { apprentice: "Apprentice", instructor: "Instructor", school_manager: "School office", admin: "Admin" };

export const ROLE_NAV: Record<NavRole, NavLink[]> = {
  apprentice: [
    { href: "/learn", label: "My classes" },
    { href: "/learn/quizzes", label: "Quizzes" },
    { href: "/learn/briefs", label: "Placement briefs" },
    { href: "/learn/certificates", label: "Certificates" },
    { href: "/learn/orders", label: "Purchases" },
  ],
  instructor: [
    { href: "/teach", label: "My classes" },
    { href: "/teach/reviews", label: "Review queue" },
    { href: "/teach/quizzes", label: "Quiz statistics" },
    { href: "/teach/certificates", label: "Certificates" },
  ],
  school_manager: [
    { href: "/school", label: "School office" },
    { href: "/school/buy", label: "Buy seats" },
    { href: "/school/orders", label: "Orders" },
  ],
  admin: [
    { href: "/admin", label: "Users" },
    { href: "/admin/audit", label: "Audit log" },
    { href: "/admin/certificates", label: "Certificates" },
    { href: "/admin/payments", label: "Payments" },
  ],
};

export const PUBLIC_NAV: NavLink[] = [
  { href: "/#for-apprentices", label: "Apprentices" },
  { href: "/#for-instructors", label: "Instructors" },
  { href: "/#for-schools", label: "Schools" },
];
