// The demo graduate (invented): an apprentice of the spring band-miking class who has finished the
// course and not yet claimed the certificate. Plain data, so the e2e tests can import it;
// db/seed-certificates.ts writes the rows.
export const DEMO_GRADUATE = { name: "Wren Ashdown", email: "wren.ashdown@kestrel-bay.example", password: "lantern-room-learn", courseSlug: "miking-the-band", className: "Spring class: Miking the band" };
