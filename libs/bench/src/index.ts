/** @hexloom/bench: calibration, drive values and exchange with the lab bench (pure, portable). */
export {};
