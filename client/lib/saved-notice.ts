/** What a form hands to the tank page after saving, shown once at the top (navigation state, not the URL). */
export interface SavedNotice {
  message: string;
  warnings: string[];
  /** Offer a jump to the charts (the care panel can push them below the fold on a phone). */
  toCharts?: boolean;
}
