/** The cautions that sit with the takeoff, after its result. */
export const TAKEOFF_CAUTIONS = [
  'Quantities are estimates from a simplified elevation: verify them against the shop drawings before ordering.',
  'Panel joints are measured gross through openings, and only fasteners certainly inside an opening are deducted; the waste allowance is the one entered here.',
  "Sealant yield depends on the joint as built, the bead profile and the gun; follow the sealant maker's published coverage and limits.",
];
