// Public exports of departure/ (filled by the area as it lands).
export {};
