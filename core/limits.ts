/** Limits shared by the API validators and the web forms. */
export const LIMITS = {
  nameMax: 120,
  emailMax: 254,
  classNameMax: 80,
  departmentNameMax: 80,
  rosterRowsMax: 1000,
  rosterBytesMax: 512 * 1024,
  searchMax: 100,
  pageSizeMax: 100,
  joinCodeLength: 8,
  signInLinkMinutes: 15,
  fileNameMax: 255,
  recordingTitleMax: 200,
  captionLabelMax: 60,
  captionBytesMax: 512 * 1024,
} as const;
