// Public exports of numerics/ (filled by the area as it lands).
export {};
