// Public exports of state/ (filled by the area as it lands).
export {};
