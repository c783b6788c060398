/** The inspection routes (server/routes/inspections.ts), one place for the client. */
const e = encodeURIComponent;
export const inspectionPaths = {
  list: (projectId: string) => `/api/projects/${e(projectId)}/inspections`,
  one: (inspectionId: string) => `/api/inspections/${e(inspectionId)}`,
  item: (itemId: string) => `/api/inspection-items/${e(itemId)}`,
  photos: (itemId: string) => `/api/inspection-items/${e(itemId)}/photos`,
  deficiencyDetails: (deficiencyId: string) => `/api/deficiencies/${e(deficiencyId)}`,
  deficiency: (deficiencyId: string, step: string) => `/api/deficiencies/${e(deficiencyId)}/${step}`,
  close: (inspectionId: string) => `/api/inspections/${e(inspectionId)}/close`,
  report: (inspectionId: string) => `/api/inspections/${e(inspectionId)}/report.pdf`,
};
