// Stylesheets (fonts) mean nothing to jsdom.
module.exports = {};
