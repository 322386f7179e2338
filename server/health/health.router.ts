import express from 'express';

export const healthRouter = express.Router().get('/', (_req, res) => {
  res.json({ status: 'ok' });
});
