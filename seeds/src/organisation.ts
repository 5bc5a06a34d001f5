/**
 * The invented insurer the demo runs in. Any resemblance to a real company is accidental:
 * the name, the regions and the `.example` mail domain (reserved by RFC 2606) are made up.
 */
export const demoOrganisation = {
  name: "Harbourline Mutual",
  mailDomain: "harbourline.example",
  regions: ["Northmere Coast", "Vellan Basin", "Ostrand Uplands"],
} as const;

export type DemoOrganisation = typeof demoOrganisation;
