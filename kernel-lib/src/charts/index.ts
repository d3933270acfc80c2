// Public exports of charts/ (filled by the area as it lands).
export {};
