// Public exports of units/ (filled by the area as it lands).
export {};
