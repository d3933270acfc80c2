// Public exports of records/ (filled by the area as it lands).
export {};
