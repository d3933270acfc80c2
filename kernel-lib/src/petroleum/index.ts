// Public exports of petroleum/ (filled by the area as it lands).
export {};
