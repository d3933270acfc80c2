// Public exports of display/ (filled by the area as it lands).
export {};
